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
    public void Digital_servo_axis_gives_the_plant_output_between_samples_and_at_them()
    {
        // plants/digital-servo-axis.toml at its nominal values: Kp = 400, Kv = 1, zc = 0.95, tm = 0.02 s, T = 1 ms.
        // By hand, the loop as the rig runs it: e_k = 1 − y(kT); the controller Kp(z − zc)/((1 − zc)z) is
        // u_k = Kp/(1 − zc)·(e_k − zc·e_{k−1}); u_k is held, and the plant Kv/(s(tm·s + 1)) (tm·y'' + y' = Kv·u)
        // from position y_k and speed v_k gives y(kT + σ) = y_k + Kv·u_k·σ + (v_k − Kv·u_k)·tm·(1 − e^{−σ/tm}),
        // v(kT + σ) = Kv·u_k + (v_k − Kv·u_k)·e^{−σ/tm} (linear ODE with a constant input, common practice).
        var (code, stdout, stderr) = CliRunner.Run("response", RepoFiles.Plant("digital-servo-axis.toml"), "--json");
        Assert.True(code == 0, stderr); // stable, overshoot under the file's 15 %
        using var doc = JsonDocument.Parse(stdout);
        var root = doc.RootElement;
        Assert.Equal("z", root.GetProperty("plane").GetString());
        Assert.Equal("sampled_between_samples", root.GetProperty("method").GetString());
        int points = root.GetProperty("points_per_sample").GetInt32();
        Assert.Equal(10, points); // |p|·T = 0.05 for the plant's fastest pole: the floor of 10 points
        var samples = root.GetProperty("samples").EnumerateArray().Select(p => (T: p[0].GetDouble(), Y: p[1].GetDouble())).ToArray();
        var between = root.GetProperty("between_samples").EnumerateArray().Select(p => (T: p[0].GetDouble(), Y: p[1].GetDouble())).ToArray();
        Assert.Equal(((samples.Length - 1) * points) + 1, between.Length);

        const double kp = 400, kv = 1, zc = 0.95, tm = 0.02, t = 0.001;
        double y = 0, v = 0, ePrev = 0;
        for (int k = 0; k < samples.Length - 1; k++)
        {
            double e = 1 - y;
            double u = kp / (1 - zc) * (e - (zc * ePrev));
            Assert.Equal(k * t, samples[k].T, 1e-15);
            Assert.Equal(y, samples[k].Y, 1e-9);
            for (int j = 0; j < points; j++)
            {
                double sigma = j * t / points;
                Assert.Equal((k * t) + sigma, between[(k * points) + j].T, 1e-15);
                Assert.Equal(y + (kv * u * sigma) + ((v - (kv * u)) * tm * (1 - Math.Exp(-sigma / tm))), between[(k * points) + j].Y, 1e-9);
            }

            (y, v, ePrev) = (y + (kv * u * t) + ((v - (kv * u)) * tm * (1 - Math.Exp(-t / tm))), (kv * u) + ((v - (kv * u)) * Math.Exp(-t / tm)), e);
        }

        double steady = root.GetProperty("steady_state").GetDouble();
        Assert.Equal(1.0, steady, 1e-9); // an integrating plant: no error in steady state (final-value theorem)
        Assert.Equal((between.Max(p => p.Y) - 1) * 100, root.GetProperty("overshoot_pct").GetDouble(), 1e-3);
        Assert.Equal((samples.Max(p => p.Y) - 1) * 100, root.GetProperty("at_sample_instants").GetProperty("overshoot_pct").GetDouble(), 1e-9);
    }

    [Fact]
    public void Text_output_of_a_sampled_loop_names_what_the_curve_is()
    {
        var (code, stdout, _) = CliRunner.Run("response", RepoFiles.Plant("digital-servo-axis.toml"), "--symbols", "ascii");
        Assert.Equal(0, code);
        Assert.Contains("(plant output between samples; the instants lie too close to mark)", stdout, StringComparison.Ordinal);
        Assert.Contains("figure                simulated  at samples   estimate", stdout, StringComparison.Ordinal);
        Assert.Contains("simulated between samples, 10 points a sample", stdout, StringComparison.Ordinal);
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
