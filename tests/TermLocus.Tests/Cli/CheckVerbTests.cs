using System.Text.Json;

namespace TermLocus.Tests.Cli;

public class CheckVerbTests
{
    // Ogata, Modern Control Engineering, 5th ed., Example 6-1 (from memory): K/(s(s+1)(s+2)) with unity negative
    // feedback has closed-loop poles at ±j√2 and -3 when K = 6 (the imaginary-axis crossing).
    private static readonly string ThirdOrderLoop = TextbookLoops.ThirdOrder("third-order textbook loop", "min_damping = 0.2", k: 6.0);

    [Fact]
    public void The_bundled_library_reports_and_exits_1_because_one_demo_fails_by_design()
    {
        var (code, stdout, stderr) = CliRunner.Run("check", RepoFiles.Plants);
        Assert.Equal(1, code);
        Assert.Equal("", stderr);
        Assert.Contains("verdict: FAIL", stdout, StringComparison.Ordinal);
        Assert.Contains("verdict: pass", stdout, StringComparison.Ordinal);
        Assert.All(stdout.Split('\n'), line => Assert.True(line.Length <= 100, line));
    }

    [Fact]
    public void A_passing_plant_exits_0()
    {
        var (code, _, _) = CliRunner.Run("check", RepoFiles.Plant("conveyor-speed.toml"));
        Assert.Equal(0, code);
    }

    [Fact]
    public void Json_follows_the_check_schema_with_poles_worst_and_located_violations()
    {
        var (code, stdout, _) = CliRunner.Run("check", RepoFiles.Plant("magnetic-bearing.toml"), "--json");
        Assert.Equal(1, code);
        using var doc = JsonDocument.Parse(stdout);
        var root = doc.RootElement;
        Assert.Equal("termlocus.check/1", root.GetProperty("schema").GetString());
        var plant = root.GetProperty("plants")[0];
        Assert.Equal("fail", plant.GetProperty("verdict").GetString());
        Assert.True(plant.GetProperty("poles").GetArrayLength() > 0);
        var pole = plant.GetProperty("poles")[0];
        foreach (var key in new[] { "re", "im", "damping", "natural_frequency", "decay_rate", "time_to_half" })
        {
            Assert.True(pole.TryGetProperty(key, out _), key);
        }

        var violation = plant.GetProperty("violations")[0];
        Assert.Equal("max_time_to_half", violation.GetProperty("spec").GetString());
        Assert.True(violation.GetProperty("actual").GetDouble() > violation.GetProperty("limit").GetDouble());
        Assert.Equal(JsonValueKind.Object, violation.GetProperty("corner").ValueKind);
        Assert.Equal(JsonValueKind.Number, plant.GetProperty("worst").GetProperty("damping").ValueKind);
    }

    [Fact]
    public void A_loop_on_the_imaginary_axis_is_reported_unstable_with_the_textbook_poles()
    {
        string file = RepoFiles.TempPlant(ThirdOrderLoop);
        var (code, stdout, _) = CliRunner.Run("check", file, "--json");
        Assert.Equal(1, code);
        using var doc = JsonDocument.Parse(stdout);
        var plant = doc.RootElement.GetProperty("plants")[0];
        Assert.False(plant.GetProperty("stable").GetBoolean());
        var poles = plant.GetProperty("poles").EnumerateArray()
            .Select(p => (Re: p.GetProperty("re").GetDouble(), Im: p.GetProperty("im").GetDouble()))
            .OrderBy(p => p.Re).ThenBy(p => p.Im).ToArray();
        Assert.Equal(-3.0, poles[0].Re, 1e-9);
        Assert.Equal(0.0, poles[1].Re, 1e-9);
        Assert.Equal(-Math.Sqrt(2), poles[1].Im, 1e-9);
        Assert.Equal(Math.Sqrt(2), poles[2].Im, 1e-9);
    }

    [Fact]
    public void Set_overrides_the_swept_value_and_changes_the_verdict()
    {
        // Same textbook loop: for 0 < K < 6 it is stable; K = 1 gives a well-damped dominant pair (ζ above 0.2).
        string file = RepoFiles.TempPlant(ThirdOrderLoop);
        var (code, stdout, _) = CliRunner.Run("check", file, "--set", "K=1");
        Assert.Equal(0, code);
        Assert.Contains("K = 1 (swept)", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void A_broken_file_gives_exit_2_one_located_line_and_nothing_on_stdout()
    {
        string file = RepoFiles.TempPlant("title = \"x\"\n[parameters]\nK = 1\n[loop]\nplant = \"2s\"\nsweep = \"K\"\n");
        var (code, stdout, stderr) = CliRunner.Run("check", file);
        Assert.Equal(2, code);
        Assert.Equal("", stdout);
        string line = Assert.Single(stderr.TrimEnd('\n').Split('\n'));
        Assert.StartsWith(file + ":5:", line, StringComparison.Ordinal);
        Assert.Contains("write 2*s", line, StringComparison.Ordinal);
    }

    [Fact]
    public void A_missing_file_and_an_unknown_parameter_are_usage_errors()
    {
        Assert.Equal(2, CliRunner.Run("check", "/nonexistent/plant.toml").Code);
        Assert.Equal(2, CliRunner.Run("check", RepoFiles.Plant("conveyor-speed.toml"), "--set", "Nope=1").Code);
    }

    [Fact]
    public void Poles_of_a_high_order_repeated_root_are_flagged_as_untrustworthy()
    {
        // K/(s+1)^30 at a tiny K: the closed-loop poles are -1 + (K)^(1/30)·e^{jθ}, a tight ring around -1. In double
        // precision a 30-fold cluster can only be resolved to about (1e-16)^(1/30) ≈ 0.3 (perturbation theory of
        // multiple roots, e.g. Wilkinson, Rounding Errors in Algebraic Processes, 1963, from memory).
        string file = RepoFiles.TempPlant("""
            title = "thirty lags in a row"
            [parameters]
            K = { value = 1e-40, range = [0.0, 1.0] }
            [loop]
            plant = "K / (s + 1)^30"
            sweep = "K"
            """);
        var (_, text, _) = CliRunner.Run("check", file);
        Assert.Contains("note: these poles are ill-conditioned", text, StringComparison.Ordinal);

        var (_, json, _) = CliRunner.Run("check", file, "--json");
        using var doc = JsonDocument.Parse(json);
        var plant = doc.RootElement.GetProperty("plants")[0];
        Assert.True(plant.GetProperty("poles_ill_conditioned").GetBoolean());
        Assert.True(plant.GetProperty("pole_spread").GetDouble() > 1e-3);
    }

    [Fact]
    public void Poles_of_a_well_separated_loop_carry_no_such_note()
    {
        string file = RepoFiles.TempPlant(ThirdOrderLoop);
        var (_, text, _) = CliRunner.Run("check", file);
        Assert.DoesNotContain("ill-conditioned", text, StringComparison.Ordinal);

        var (_, json, _) = CliRunner.Run("check", file, "--json");
        using var doc = JsonDocument.Parse(json);
        var plant = doc.RootElement.GetProperty("plants")[0];
        Assert.False(plant.GetProperty("poles_ill_conditioned").GetBoolean());
        Assert.True(plant.GetProperty("pole_spread").GetDouble() < 1e-9);
    }

    [Fact]
    public void A_pole_at_the_origin_is_called_marginal_not_unstable()
    {
        // K = 0 leaves the open-loop poles 0, -1, -2: the integrator sits on the stability boundary (common practice:
        // a pole on the imaginary axis is marginally stable, not unstable), and a check still fails it.
        string file = RepoFiles.TempPlant(ThirdOrderLoop);
        var (code, text, _) = CliRunner.Run("check", file, "--set", "K=0");
        Assert.Equal(1, code);
        Assert.Contains("verdict: FAIL ! the closed loop is only marginally stable", text, StringComparison.Ordinal);
    }
}
