using System.Text.Json;

namespace TermLocus.Tests.Cli;

public class ResponseVerbTests
{
    // Unity feedback around wn^2/(s(s + 2 zeta wn)) gives the standard second-order closed loop
    // wn^2/(s^2 + 2 zeta wn s + wn^2). With zeta = 0.5, wn = 2: overshoot 100·exp(-zeta·pi/sqrt(1-zeta^2)) = 16.303 %,
    // peak time pi/(wn·sqrt(1-zeta^2)) = 1.8138 s (Ogata, Modern Control Engineering, 5th ed., §5-3, from memory).
    private const string SecondOrder = """
        title = "standard second-order loop"
        [parameters]
        wn = { value = 2.0, range = [0.5, 5.0] }
        zeta = 0.5
        [loop]
        plant = "wn^2 / (s*(s + 2*zeta*wn))"
        sweep = "wn"
        [specs]
        max_overshoot_pct = 10
        """;

    [Fact]
    public void Json_figures_match_the_second_order_closed_forms()
    {
        var (code, stdout, stderr) = CliRunner.Run("response", RepoFiles.TempPlant(SecondOrder), "--json");
        Assert.True(code == 1, stderr); // 16.3 % overshoot misses max_overshoot_pct = 10
        using var doc = JsonDocument.Parse(stdout);
        var root = doc.RootElement;
        Assert.Equal("termlocus.response/1", root.GetProperty("schema").GetString());
        double zeta = 0.5, wn = 2.0;
        double overshoot = 100 * Math.Exp(-zeta * Math.PI / Math.Sqrt(1 - (zeta * zeta)));
        Assert.Equal(overshoot, root.GetProperty("overshoot_pct").GetDouble(), 1e-3);
        Assert.Equal(Math.PI / (wn * Math.Sqrt(1 - (zeta * zeta))), root.GetProperty("peak_time").GetDouble(), 1e-3);
        Assert.Equal(1.0, root.GetProperty("steady_state").GetDouble(), 1e-12);
        Assert.Equal(overshoot, root.GetProperty("estimates").GetProperty("overshoot_pct").GetDouble(), 1e-9);
        Assert.True(root.GetProperty("samples").GetArrayLength() > 100);
    }

    [Fact]
    public void The_overshoot_limit_is_a_spec_in_check_too()
    {
        var (code, stdout, _) = CliRunner.Run("check", RepoFiles.TempPlant(SecondOrder));
        Assert.Equal(1, code);
        Assert.Contains("max_overshoot_pct", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unstable_loop_has_null_figures_and_exit_1()
    {
        // K/(s(s+1)(s+2)) is unstable for K > 6 (Ogata, 5th ed., Example 6-1, from memory).
        string file = RepoFiles.TempPlant("""
            title = "unstable"
            [parameters]
            K = { value = 8.0, range = [0.0, 20.0] }
            [loop]
            plant = "K / (s*(s + 1)*(s + 2))"
            sweep = "K"
            """);
        var (code, stdout, _) = CliRunner.Run("response", file, "--json");
        Assert.Equal(1, code);
        using var doc = JsonDocument.Parse(stdout);
        Assert.False(doc.RootElement.GetProperty("stable").GetBoolean());
        Assert.Equal(JsonValueKind.Null, doc.RootElement.GetProperty("overshoot_pct").ValueKind);
        Assert.Equal(JsonValueKind.Null, doc.RootElement.GetProperty("steady_state").ValueKind);
    }

    [Fact]
    public void Text_output_shows_a_plot_and_both_columns_of_figures()
    {
        var (code, stdout, _) = CliRunner.Run("response", RepoFiles.Plant("press-cylinder-position.toml"), "--symbols", "ascii");
        Assert.Equal(0, code);
        Assert.Contains("2nd-order estimate", stdout, StringComparison.Ordinal);
        Assert.Contains("settling 2 % s", stdout, StringComparison.Ordinal);
    }
}
