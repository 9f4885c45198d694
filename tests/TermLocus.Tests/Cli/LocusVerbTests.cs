using System.Text.Json;

namespace TermLocus.Tests.Cli;

public class LocusVerbTests
{
    // Ogata, Modern Control Engineering, 5th ed., Example 6-1 (from memory): G = K/(s(s+1)(s+2)).
    // Asymptotes: centroid -1, angles ±60° and 180°; breakaway at s = -0.4226 with K = 0.3849;
    // imaginary-axis crossing at ω = √2 with K = 6; stable for 0 < K < 6.
    private static readonly string OgataLoop = TextbookLoops.ThirdOrder("third-order textbook loop", "min_damping = 0.5");

    // Ogata, Discrete-Time Control Systems, 2nd ed., ch. 4 (from memory): K/(s(s+1)) behind a zero-order hold with
    // T = 1 s is stable for 0 < K < (e-1)/(e-2) ≈ 2.3922 (Jury test on z^2 + (0.3679K - 1.3679)z + 0.3679 + 0.2642K).
    private static readonly string SampledLoop = TextbookLoops.SampledTypeOne("sampled textbook loop");

    [Fact]
    public void Analyze_json_gives_the_textbook_construction_facts()
    {
        var (code, stdout, stderr) = CliRunner.Run("analyze", RepoFiles.TempPlant(OgataLoop), "--json");
        Assert.True(code == 0, stderr);
        using var doc = JsonDocument.Parse(stdout);
        var root = doc.RootElement;
        Assert.Equal("termlocus.analyze/1", root.GetProperty("schema").GetString());
        Assert.True(root.GetProperty("affine").GetBoolean());
        var asymptotes = root.GetProperty("asymptotes");
        Assert.Equal(-1.0, asymptotes.GetProperty("centroid").GetDouble(), 1e-9);
        var angles = asymptotes.GetProperty("angles_deg").EnumerateArray().Select(a => a.GetDouble()).Order().ToArray();
        Assert.Equal(new[] { -60.0, 60.0, 180.0 }, angles.Select(a => Math.Round(a, 9)).ToArray());
        var breakaway = root.GetProperty("break_points").EnumerateArray().Single();
        Assert.Equal(-1 + (1 / Math.Sqrt(3)), breakaway.GetProperty("re").GetDouble(), 1e-9);
        Assert.Equal(0.3849, breakaway.GetProperty("value").GetDouble(), 1e-4);
        Assert.Equal("breakaway", breakaway.GetProperty("kind").GetString());
        var crossing = root.GetProperty("axis_crossings").EnumerateArray().Single();
        Assert.Equal(Math.Sqrt(2), crossing.GetProperty("omega").GetDouble(), 1e-9);
        Assert.Equal(6.0, crossing.GetProperty("value").GetDouble(), 1e-9);
        var stable = root.GetProperty("stable_intervals").EnumerateArray().Single();
        Assert.Equal(0.0, stable.GetProperty("from").GetDouble(), 1e-12);
        Assert.Equal(6.0, stable.GetProperty("to").GetDouble(), 1e-9);
    }

    [Fact]
    public void Analyze_finds_the_damping_boundary_where_the_dominant_pair_reaches_zeta_one_half()
    {
        // Same loop, derived by hand (common practice: put s = r·e^{j120°} on the ζ = 0.5 line into
        // s^3 + 3s^2 + 2s + K = 0): the imaginary part gives r = 2/3, the real part K = 28/27 ≈ 1.0370.
        // (The book reads about 1.04 off its graph.)
        var (_, stdout, _) = CliRunner.Run("analyze", RepoFiles.TempPlant(OgataLoop), "--json");
        using var doc = JsonDocument.Parse(stdout);
        var boundary = doc.RootElement.GetProperty("spec_boundaries").EnumerateArray()
            .Single(b => b.GetProperty("spec").GetString() == "min_damping");
        Assert.Equal(28.0 / 27.0, boundary.GetProperty("value").GetDouble(), 1e-9);
    }

    [Fact]
    public void Analyze_of_a_sampled_loop_reports_the_unit_circle_stability_limit()
    {
        var (code, stdout, stderr) = CliRunner.Run("analyze", RepoFiles.TempPlant(SampledLoop), "--json");
        Assert.True(code == 0, stderr);
        using var doc = JsonDocument.Parse(stdout);
        Assert.Equal("z", doc.RootElement.GetProperty("plane").GetString());
        var stable = doc.RootElement.GetProperty("stable_intervals").EnumerateArray().Single();
        Assert.Equal((Math.E - 1) / (Math.E - 2), stable.GetProperty("to").GetDouble(), 1e-8);
    }

    [Fact]
    public void Analyze_text_names_each_fact_for_every_demo_plant()
    {
        foreach (var file in Directory.GetFiles(RepoFiles.Plants, "*.toml"))
        {
            var (code, stdout, stderr) = CliRunner.Run("analyze", file);
            Assert.True(code == 0, file + ": " + stderr);
            Assert.Contains("stable for", stdout, StringComparison.Ordinal);
            Assert.DoesNotContain("nan", stdout, StringComparison.OrdinalIgnoreCase);
        }
    }

    [Fact]
    public void Trace_csv_has_a_header_and_one_row_per_point_of_every_branch()
    {
        var (code, stdout, _) = CliRunner.Run("trace", RepoFiles.TempPlant(OgataLoop), "--csv", "--from", "0", "--to", "10");
        Assert.Equal(0, code);
        var lines = stdout.TrimEnd('\n').Split('\n');
        Assert.Equal("value,branch,re,im", lines[0]);
        var branches = lines.Skip(1).Select(l => l.Split(',')[1]).Distinct().ToArray();
        Assert.Equal(3, branches.Length);
        Assert.All(lines.Skip(1), l => Assert.Equal(4, l.Split(',').Length));
    }

    [Fact]
    public void Trace_rejects_csv_with_json_and_a_reversed_span()
    {
        string file = RepoFiles.TempPlant(OgataLoop);
        Assert.Equal(2, CliRunner.Run("trace", file, "--csv", "--json").Code);
        Assert.Equal(2, CliRunner.Run("trace", file, "--from", "5", "--to", "1").Code);
    }

    [Theory]
    [InlineData("100x30", "braille", 30)]
    [InlineData("80x24", "ascii", 24)]
    public void Plot_prints_exactly_the_requested_height_with_a_legend(string size, string symbols, int height)
    {
        var (code, stdout, stderr) = CliRunner.Run("plot", RepoFiles.Plant("press-cylinder-position.toml"), "--size", size, "--symbols", symbols);
        Assert.True(code == 0, stderr);
        var lines = stdout.TrimEnd('\n').Split('\n');
        Assert.Equal(height, lines.Length);
        Assert.Contains("closed-loop pole", lines[^1], StringComparison.Ordinal);
        Assert.DoesNotContain('\u2800', stdout);
        if (symbols == "ascii")
        {
            Assert.All(stdout, c => Assert.True(c < 128, $"non-ASCII {(int)c}"));
        }
    }
}
