using System.Globalization;
using System.Text.Json;

namespace TermLocus.Tests.Cli;

/// <summary>
/// What each spec is judged on, as check and response say it: max_overshoot_pct on the simulated step response (at
/// nominal as well as across the band), max_settling_time as 4/σ of the slowest pole (the plant-file definition).
/// </summary>
public class SpecBasisTests
{
    // K/(s(s + 2)) with K = 4 closes to 4/(s² + 2s + 4): ζ = 0.5, ωn = 2 rad/s, σ = 1/s, so 4/σ = 4 s and the step
    // overshoot is 100·exp(-πζ/√(1 - ζ²)) = 16.30 % (Ogata, Modern Control Engineering, 5th ed., §5-3, the formulas
    // for the maximum overshoot and the 2 % settling time 4/(ζωn); from memory).
    private const string SecondOrder = """
        title = "second-order textbook loop (invented example)"
        [parameters]
        K = { value = 4.0, range = [0.0, 20.0] }
        [loop]
        plant = "K / (s*(s + 2))"
        sweep = "K"
        [specs]
        max_settling_time = 5
        max_overshoot_pct = 15
        """;

    private static readonly double TextbookOvershoot = 100 * Math.Exp(-Math.PI * 0.5 / Math.Sqrt(0.75));

    [Fact]
    public void The_nominal_overshoot_is_shown_and_judged_in_the_nominal_column()
    {
        var (code, stdout, stderr) = CliRunner.Run("check", RepoFiles.TempPlant(SecondOrder));
        Assert.Equal(1, code);
        Assert.Equal("", stderr);
        string row = stdout.Split('\n').Single(l => l.StartsWith("  max_overshoot_pct ", StringComparison.Ordinal) && l.Contains('≤', StringComparison.Ordinal));
        var cells = row.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        // spec, relation, limit, nominal, mark, worst, mark, where
        Assert.Equal(TextbookOvershoot, double.Parse(cells[3], CultureInfo.InvariantCulture), 0.01);
        Assert.Equal("!", cells[4]);
        Assert.Contains("verdict: FAIL ! max_overshoot_pct: step response overshoot 16.30 % > 15 % (with nominal)", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void The_overshoot_verdict_names_the_figure_and_the_band_point_not_a_pole()
    {
        // Heat-exchanger demo at Kp = 5 (the review's case): nominal and corner Kh +25 % both overshoot the 25 % limit.
        var (_, stdout, _) = CliRunner.Run("check", RepoFiles.Plant("heat-exchanger-outlet.toml"), "--set", "Kp=5");
        string verdict = stdout.Split('\n').Single(l => l.Contains("verdict:", StringComparison.Ordinal));
        Assert.Matches(@"max_overshoot_pct: step response overshoot \d+\.\d+ % > 25 % \(with Kh \+25 %\)", verdict);
        Assert.DoesNotMatch(@"overshoot.* at -?\d", verdict);
    }

    [Fact]
    public void Json_carries_the_nominal_and_worst_overshoot_that_response_simulates()
    {
        string file = RepoFiles.Plant("heat-exchanger-outlet.toml");
        var (_, checkJson, _) = CliRunner.Run("check", file, "--set", "Kp=5", "--json");
        var (_, responseJson, _) = CliRunner.Run("response", file, "--set", "Kp=5", "--json");
        using var check = JsonDocument.Parse(checkJson);
        using var response = JsonDocument.Parse(responseJson);
        var plant = check.RootElement.GetProperty("plants")[0];
        var overshoot = plant.GetProperty("specs").EnumerateArray().Single(s => s.GetProperty("spec").GetString() == "max_overshoot_pct");
        double simulated = response.RootElement.GetProperty("overshoot_pct").GetDouble();
        // Same simulation at the same values: the figures agree to rounding (common practice: one source for both).
        Assert.Equal(simulated, overshoot.GetProperty("nominal").GetDouble(), 1e-9);
        Assert.Equal("step_response", overshoot.GetProperty("judged_on").GetString());
        Assert.False(overshoot.GetProperty("nominal_met").GetBoolean());
        Assert.True(overshoot.GetProperty("worst").GetDouble() >= simulated);
        Assert.Equal(25, overshoot.GetProperty("limit").GetDouble(), 1e-12);
        Assert.Equal(1, overshoot.GetProperty("corner").GetProperty("Kh").GetDouble(), 1e-9);
        Assert.Equal("poles_4_over_sigma", plant.GetProperty("specs").EnumerateArray()
            .Single(s => s.GetProperty("spec").GetString() == "max_settling_time").GetProperty("judged_on").GetString());
    }

    [Fact]
    public void The_check_table_labels_the_settling_figure_as_4_over_sigma()
    {
        var (_, stdout, _) = CliRunner.Run("check", RepoFiles.TempPlant(SecondOrder));
        string row = stdout.Split('\n').Single(l => l.StartsWith("  max_settling_time ", StringComparison.Ordinal) && l.Contains('≤', StringComparison.Ordinal));
        Assert.StartsWith("  max_settling_time 4/σ ", row, StringComparison.Ordinal);
        Assert.Equal(4.0, double.Parse(row.Split(' ', StringSplitOptions.RemoveEmptyEntries)[4], CultureInfo.InvariantCulture), 1e-3);
        Assert.Contains("max_settling_time is judged as 4/σ of the slowest pole", stdout, StringComparison.Ordinal);
        Assert.All(stdout.Split('\n'), line => Assert.True(line.Length <= 100, line));
    }

    [Fact]
    public void The_response_report_says_settling_is_judged_as_4_over_sigma_beside_the_simulated_figure()
    {
        var (_, stdout, _) = CliRunner.Run("response", RepoFiles.TempPlant(SecondOrder));
        Assert.Contains("  max_settling_time ≤ 5 s is judged as 4/σ of the slowest pole: 4.000 s ✓\n", stdout, StringComparison.Ordinal);
        string simulatedRow = stdout.Split('\n').Single(l => l.Contains("settling 2 % s", StringComparison.Ordinal));
        string simulated = simulatedRow.Split(' ', StringSplitOptions.RemoveEmptyEntries)[4];
        Assert.Contains($"(the simulated 2 % settling time, {simulated} s, is shown for comparison and not judged)", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void The_response_report_adds_no_settling_line_when_the_file_sets_no_settling_limit()
    {
        var (_, stdout, _) = CliRunner.Run("response", RepoFiles.TempPlant(SecondOrder.Replace("max_settling_time = 5\n", "", StringComparison.Ordinal)));
        Assert.DoesNotContain("judged as 4/", stdout, StringComparison.Ordinal);
    }
}
