using System.Globalization;
using System.Text.Json;

namespace TermLocus.Tests.Cli;

public class DesignVerbTests
{
    // Ogata, Modern Control Engineering, 5th ed., Ch. 6, the K/(s(s+1)(s+2)) root-locus example (from memory): the
    // dominant pair has ζ = 0.5 near s = -0.3337 ± j0.5780 with K = 1.0383, read off the plot. Exactly: with the pair
    // at -a ± j a√3 and the third pole at -b, (s^2 + 2as + 4a^2)(s + b) = s^3 + 3s^2 + 2s + K gives 2a + b = 3,
    // 4a^2 + 2ab = 2, so a = 1/3, b = 7/3 and K = 4a^2 b = 28/27 = 1.037037. Below the breakaway (K = 0.3849) all
    // poles are real (ζ = 1); at K = 0 one sits at the origin. So ζ >= 0.5 holds for 0 < K <= 28/27.
    private static readonly string OgataLoop = TextbookLoops.ThirdOrder("third-order textbook loop", "min_damping = 0.5");

    // Same loop with a decay rate no gain reaches: P = s^3 + 3s^2 + 2s + K, so the decay rates of the three poles sum
    // to 3 for every K (sum of roots = -a2/a3; common practice), and all three cannot reach 1.5 (sum 4.5).
    private static readonly string Infeasible = TextbookLoops.ThirdOrder("no feasible gain", "min_decay_rate = 1.5");

    // Ogata, Discrete-Time Control Systems, 2nd ed., ch. 4 (from memory): K/(s(s+1)) behind a zero-order hold with
    // T = 1 s is stable for 0 < K < (e-1)/(e-2) ≈ 2.3922 (Jury test).
    private static readonly string SampledLoop = TextbookLoops.SampledTypeOne("sampled textbook loop");

    [Fact]
    public void Json_gives_the_textbook_damping_limit_as_the_solved_upper_end()
    {
        var (code, stdout, stderr) = CliRunner.Run("design", RepoFiles.TempPlant(OgataLoop), "--json");
        Assert.True(code == 0, stderr);
        using var doc = JsonDocument.Parse(stdout);
        var root = doc.RootElement;
        Assert.Equal("termlocus.design/1", root.GetProperty("schema").GetString());
        Assert.Equal("K", root.GetProperty("sweep").GetProperty("name").GetString());
        Assert.Equal(0.0, root.GetProperty("sweep").GetProperty("from").GetDouble());
        Assert.Equal(20.0, root.GetProperty("sweep").GetProperty("to").GetDouble());
        Assert.Empty(root.GetProperty("band").EnumerateObject());
        var interval = Assert.Single(root.GetProperty("intervals").EnumerateArray().ToList());
        Assert.Equal(0.0, interval.GetProperty("from").GetDouble(), 1e-9);
        Assert.Equal(28.0 / 27.0, interval.GetProperty("to").GetDouble(), 1e-9);
        Assert.Equal(1.0383, interval.GetProperty("to").GetDouble(), 2e-3); // the textbook's graphical reading
        Assert.Equal(["min_damping", "stability"], Strings(interval.GetProperty("limited_by")));
        var recommended = root.GetProperty("recommended");
        Assert.InRange(recommended.GetProperty("value").GetDouble(), 0.0, 28.0 / 27.0);
        Assert.Equal("min_damping", recommended.GetProperty("smallest_margin").GetProperty("spec").GetString());
        Assert.True(recommended.GetProperty("smallest_margin").GetProperty("margin").GetDouble() > 0.0);
        Assert.Equal("pass", recommended.GetProperty("verdict").GetString());
    }

    [Fact]
    public void The_failing_demo_gets_a_recommended_gain_that_passes_the_check_across_the_band()
    {
        string file = RepoFiles.Plant("magnetic-bearing.toml");
        var (code, stdout, _) = CliRunner.Run("design", file, "--json");
        Assert.Equal(0, code);
        using var doc = JsonDocument.Parse(stdout);
        var root = doc.RootElement;
        // The file's note: Ks ±15 % around 4e5 N/m, and "a gain near 3500 A/m meets every spec across the whole band".
        var ks = root.GetProperty("band").GetProperty("Ks").EnumerateArray().Select(v => v.GetDouble()).ToArray();
        Assert.Equal(4.0e5 * 0.85, ks[0], 1e-6);
        Assert.Equal(4.0e5 * 1.15, ks[1], 1e-6);
        var interval = Assert.Single(root.GetProperty("intervals").EnumerateArray().ToList());
        Assert.InRange(3500.0, interval.GetProperty("from").GetDouble(), interval.GetProperty("to").GetDouble());
        Assert.Equal(["max_time_to_half"], Strings(interval.GetProperty("from_limited_by")));
        Assert.Equal(["min_damping"], Strings(interval.GetProperty("to_limited_by")));
        double value = root.GetProperty("recommended").GetProperty("value").GetDouble();

        // The check verb (corners and interior search) agrees: the file fails as shipped and passes at this gain.
        Assert.Equal(1, CliRunner.Run("check", file).Code);
        Assert.Equal(0, CliRunner.Run("check", file, "--set", "Kp=" + value.ToString("R", CultureInfo.InvariantCulture)).Code);
    }

    [Fact]
    public void Every_demo_plant_gets_an_interval_and_a_recommended_value_the_check_verb_passes()
    {
        foreach (string file in Directory.GetFiles(RepoFiles.Plants, "*.toml"))
        {
            var (code, stdout, _) = CliRunner.Run("design", file, "--json");
            Assert.True(code == 0, file);
            using var doc = JsonDocument.Parse(stdout);
            var root = doc.RootElement;
            string sweep = root.GetProperty("sweep").GetProperty("name").GetString()!;
            double value = root.GetProperty("recommended").GetProperty("value").GetDouble();
            var check = CliRunner.Run("check", file, "--set", $"{sweep}={value.ToString("R", CultureInfo.InvariantCulture)}");
            Assert.True(check.Code == 0, file + "\n" + check.Out);
        }
    }

    [Fact]
    public void Text_shows_the_intervals_their_limits_and_a_bar_within_100_columns()
    {
        foreach (string file in Directory.GetFiles(RepoFiles.Plants, "*.toml"))
        {
            var (code, stdout, stderr) = CliRunner.Run("design", file);
            Assert.Equal(0, code);
            Assert.Equal("", stderr);
            var lines = stdout.TrimEnd('\n').Split('\n');
            Assert.All(lines, line => Assert.True(line.Length <= 100, line));
            Assert.Contains(lines, l => l.Contains("feasible", StringComparison.Ordinal));
            Assert.Contains(lines, l => l.Contains("recommended:", StringComparison.Ordinal));
            Assert.Contains(lines, l => l.Contains("searched only at the recommended value", StringComparison.Ordinal));
            string bar = Assert.Single(lines, l => l.Contains(" [", StringComparison.Ordinal) && l.TrimEnd().Contains("] ", StringComparison.Ordinal));
            Assert.Contains("=", bar, StringComparison.Ordinal);
            Assert.Contains("|", bar, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void No_feasible_value_gives_exit_1_an_empty_list_and_no_recommendation()
    {
        string file = RepoFiles.TempPlant(Infeasible);
        var (code, stdout, _) = CliRunner.Run("design", file, "--json");
        Assert.Equal(1, code);
        using var doc = JsonDocument.Parse(stdout);
        Assert.Equal(0, doc.RootElement.GetProperty("intervals").GetArrayLength());
        Assert.Equal(JsonValueKind.Null, doc.RootElement.GetProperty("recommended").ValueKind);

        var text = CliRunner.Run("design", file);
        Assert.Equal(1, text.Code);
        Assert.Contains("feasible K: none", text.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void A_sampled_loop_is_feasible_on_its_stable_interval()
    {
        var (code, stdout, _) = CliRunner.Run("design", RepoFiles.TempPlant(SampledLoop), "--json");
        Assert.Equal(0, code);
        using var doc = JsonDocument.Parse(stdout);
        var interval = Assert.Single(doc.RootElement.GetProperty("intervals").EnumerateArray().ToList());
        double upper = (Math.E - 1.0) / (Math.E - 2.0);
        Assert.Equal(upper, interval.GetProperty("to").GetDouble(), 1e-9 * upper);
        Assert.Equal(["stability"], Strings(interval.GetProperty("limited_by")));
    }

    [Fact]
    public void Set_and_span_options_apply_and_bad_input_exits_2_with_one_line()
    {
        // --to below the textbook limit: the whole span above 0 is feasible and the upper end is the span's.
        var (code, stdout, _) = CliRunner.Run("design", RepoFiles.TempPlant(OgataLoop), "--json", "--to", "0.5");
        Assert.Equal(0, code);
        using (var doc = JsonDocument.Parse(stdout))
        {
            var interval = doc.RootElement.GetProperty("intervals")[0];
            Assert.Equal(0.5, interval.GetProperty("to").GetDouble());
            Assert.Empty(interval.GetProperty("to_limited_by").EnumerateArray());
        }

        var reversed = CliRunner.Run("design", RepoFiles.TempPlant(OgataLoop), "--from", "3", "--to", "1");
        Assert.Equal(2, reversed.Code);
        Assert.Equal("", reversed.Out);
        Assert.Single(reversed.Err.TrimEnd('\n').Split('\n'));

        var unknown = CliRunner.Run("design", RepoFiles.Plant("conveyor-speed.toml"), "--set", "Nope=1");
        Assert.Equal(2, unknown.Code);
        Assert.Equal("", unknown.Out);

        string broken = RepoFiles.TempPlant("title = \"x\"\n[parameters]\nK = 1\n[loop]\nplant = \"2s\"\nsweep = \"K\"\n");
        var bad = CliRunner.Run("design", broken);
        Assert.Equal(2, bad.Code);
        Assert.Equal("", bad.Out);
        Assert.StartsWith(broken + ":5:", Assert.Single(bad.Err.TrimEnd('\n').Split('\n')), StringComparison.Ordinal);
    }

    [Fact]
    public void An_overshoot_limit_that_does_not_bind_is_named_as_judged_and_the_smallest_margin_is_a_pole_limit()
    {
        // The Ogata loop again with the pole a toleranced and an overshoot limit of 25 %: ζ >= 0.5 keeps the overshoot
        // well below it, so min_damping still ends the interval; the report says overshoot was judged and every line
        // still fits 100 columns although the lower end carries two limits.
        string file = RepoFiles.TempPlant(OgataLoop.Replace("[loop]", "a = { value = 1.0, tolerance_pct = 20 }\n[loop]", StringComparison.Ordinal)
            .Replace("(s + 1)", "(s + a)", StringComparison.Ordinal) + "\nmax_overshoot_pct = 25\n");
        var (code, stdout, _) = CliRunner.Run("design", file, "--json");
        Assert.Equal(0, code);
        using var doc = JsonDocument.Parse(stdout);
        var root = doc.RootElement;
        Assert.Equal(["min_damping", "max_overshoot_pct"], Strings(root.GetProperty("limits_judged")));
        Assert.Equal(["min_damping"], Strings(root.GetProperty("intervals")[0].GetProperty("to_limited_by")));
        var recommended = root.GetProperty("recommended");
        Assert.Equal("min_damping", recommended.GetProperty("smallest_margin").GetProperty("spec").GetString());
        Assert.True(recommended.GetProperty("overshoot").GetProperty("worst_pct").GetDouble() <= 25.0);
        Assert.Equal(25.0, recommended.GetProperty("overshoot").GetProperty("limit_pct").GetDouble());

        var text = CliRunner.Run("design", file);
        Assert.Contains("max_overshoot_pct ≤ 25 %", text.Out, StringComparison.Ordinal);
        Assert.Contains("overshoot: judged on the simulated step response", text.Out, StringComparison.Ordinal);
        Assert.Contains("largest overshoot across the band:", text.Out, StringComparison.Ordinal);
        Assert.All(text.Out.TrimEnd('\n').Split('\n'), line => Assert.True(line.Length <= 100, line));
        Assert.Contains("below: min_damping and stability", text.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void An_overshoot_limit_ends_the_interval_at_the_handbook_gain_and_the_check_verb_agrees_on_both_sides()
    {
        // K/(s(s + 2)) with time to half <= 1 s: every K >= 1 gives complex poles at σ = 1 1/s, so the pole limits
        // alone would leave the whole span up to 80 and recommend a gain far beyond the overshoot limit. ζ = 2/(2√K),
        // and overshoot 100·exp(-πζ/√(1-ζ²)) <= 10 % (Ogata, Modern Control Engineering, 5th ed., Sec. 5-3, from
        // memory) gives K <= 1/ζ*², ζ* = -ln 0.1/√(π² + ln² 0.1) = 0.5912, K <= 2.8615.
        string file = RepoFiles.TempPlant("""
            title = "second-order overshoot"
            [parameters]
            K = { value = 1.0, range = [0.0, 80.0] }
            [loop]
            plant = "K / (s*(s + 2))"
            sweep = "K"
            [specs]
            max_time_to_half = 1.0
            max_overshoot_pct = 10
            """);
        var (code, stdout, stderr) = CliRunner.Run("design", file, "--json");
        Assert.True(code == 0, stderr);
        using var doc = JsonDocument.Parse(stdout);
        double l = Math.Log(0.1), zeta = -l / Math.Sqrt((Math.PI * Math.PI) + (l * l)), upper = 1.0 / (zeta * zeta);
        var interval = Assert.Single(doc.RootElement.GetProperty("intervals").EnumerateArray().ToList());
        double to = interval.GetProperty("to").GetDouble();
        Assert.Equal(upper, to, 1e-5 * upper); // the simulated figure's accuracy, see RobustDesign
        Assert.Equal(["max_overshoot_pct"], Strings(interval.GetProperty("to_limited_by")));
        Assert.Equal("pass", doc.RootElement.GetProperty("recommended").GetProperty("verdict").GetString());

        string value = doc.RootElement.GetProperty("recommended").GetProperty("value").GetDouble().ToString("R", CultureInfo.InvariantCulture);
        Assert.Equal(0, CliRunner.Run("check", file, "--set", "K=" + value).Code);
        Assert.Equal(0, CliRunner.Run("check", file, "--set", "K=" + (to * (1 - 1e-6)).ToString("R", CultureInfo.InvariantCulture)).Code);
        Assert.Equal(1, CliRunner.Run("check", file, "--set", "K=" + (to * (1 + 1e-6)).ToString("R", CultureInfo.InvariantCulture)).Code);

        var text = CliRunner.Run("design", file);
        Assert.Contains("above: max_overshoot_pct", text.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void The_conveyor_demo_with_a_12_percent_limit_is_bounded_by_overshoot_at_both_ends_and_its_value_passes_check()
    {
        // Invented limit on the demo file: its overshoot is about 23 % at the low end of the pole-feasible gains, 9 % in
        // the middle and 14.5 % at the high end, so 12 % cuts both ends. All text still fits 100 columns, the four
        // limits wrapping onto a second line.
        string text = File.ReadAllText(RepoFiles.Plant("conveyor-speed.toml"))
            .Replace("max_natural_frequency = 400", "max_natural_frequency = 400\nmax_overshoot_pct = 12", StringComparison.Ordinal);
        string file = RepoFiles.TempPlant(text);
        var (code, stdout, _) = CliRunner.Run("design", file, "--json");
        Assert.Equal(0, code);
        using var doc = JsonDocument.Parse(stdout);
        var interval = Assert.Single(doc.RootElement.GetProperty("intervals").EnumerateArray().ToList());
        Assert.Equal(["max_overshoot_pct"], Strings(interval.GetProperty("from_limited_by")));
        Assert.Equal(["max_overshoot_pct"], Strings(interval.GetProperty("to_limited_by")));
        var recommended = doc.RootElement.GetProperty("recommended");
        Assert.True(recommended.GetProperty("overshoot").GetProperty("worst_pct").GetDouble() <= 12.0);
        string value = recommended.GetProperty("value").GetDouble().ToString("R", CultureInfo.InvariantCulture);
        Assert.Equal(0, CliRunner.Run("check", file, "--set", "Kp=" + value).Code);

        var lines = CliRunner.Run("design", file).Out.TrimEnd('\n').Split('\n');
        Assert.All(lines, line => Assert.True(line.Length <= 100, line));
        Assert.Contains(lines, l => l.StartsWith("         max_overshoot_pct ", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.Contains("below: max_overshoot_pct; above: max_overshoot_pct", StringComparison.Ordinal));
    }

    [Fact]
    public void A_characteristic_polynomial_alone_leaves_the_overshoot_limit_unjudged_and_says_so()
    {
        // The Ogata loop's characteristic s^3 + 3s^2 + 2s + K (expanded by hand) gives no step response to simulate.
        string file = RepoFiles.TempPlant(OgataLoop.Replace("plant = \"K / (s*(s + 1)*(s + 2))\"",
            "characteristic = \"s^3 + 3*s^2 + 2*s + K\"", StringComparison.Ordinal) + "\nmax_overshoot_pct = 5\n");
        var (code, stdout, _) = CliRunner.Run("design", file, "--json");
        Assert.Equal(0, code);
        using var doc = JsonDocument.Parse(stdout);
        Assert.Equal(["min_damping"], Strings(doc.RootElement.GetProperty("limits_judged")));
        Assert.Equal(28.0 / 27.0, doc.RootElement.GetProperty("intervals")[0].GetProperty("to").GetDouble(), 1e-9);
        Assert.Equal(JsonValueKind.Null, doc.RootElement.GetProperty("recommended").GetProperty("overshoot").ValueKind);
        Assert.Contains("max_overshoot_pct is not judged", CliRunner.Run("design", file).Out, StringComparison.Ordinal);
    }

    private static string[] Strings(JsonElement array) => [.. array.EnumerateArray().Select(e => e.GetString()!)];
}
