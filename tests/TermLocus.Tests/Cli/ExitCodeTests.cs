using System.Text.Json;

namespace TermLocus.Tests.Cli;

/// <summary>
/// The exit code of each verb (README, "Verbs for scripts and CI"): verdict verbs exit 0 when every spec they judge
/// is met and 1 when one is missed; the verbs that describe the locus over a span exit 0 when done; all exit 2 for
/// bad input.
/// </summary>
public class ExitCodeTests
{
    // K/(s(s + 1)(s + 2)) is stable for 0 < K < 6 (Ogata, Modern Control Engineering, 5th ed., Example 6-1, from
    // memory); at K = 1 the dominant pair is −0.3376 ± j0.5623 (ζ ≈ 0.515), so min_damping 0.9 is missed.
    private static readonly string MissesDamping = TextbookLoops.ThirdOrder("third-order loop missing its damping spec", "min_damping = 0.9");

    private static readonly string MeetsDamping = TextbookLoops.ThirdOrder("third-order loop meeting its damping spec", "min_damping = 0.4");

    [Theory]
    [InlineData("check", 1)]
    [InlineData("response", 1)]
    [InlineData("design", 0)] // a lower K meets ζ 0.9 (the pair stays real up to the breakaway gain 0.385)
    [InlineData("analyze", 0)]
    [InlineData("trace", 0)]
    [InlineData("plot", 0)]
    public void A_plant_missing_a_spec_at_its_value(string verb, int expected)
    {
        var (code, _, stderr) = CliRunner.Run(verb, RepoFiles.TempPlant(MissesDamping));
        Assert.True(code == expected, $"{verb}: exit {code}, {stderr}");
    }

    [Theory]
    [InlineData("check")]
    [InlineData("response")]
    [InlineData("design")]
    [InlineData("analyze")]
    [InlineData("trace")]
    [InlineData("plot")]
    public void A_plant_meeting_its_specs_exits_0(string verb)
    {
        var (code, _, stderr) = CliRunner.Run(verb, RepoFiles.TempPlant(MeetsDamping));
        Assert.True(code == 0, $"{verb}: exit {code}, {stderr}");
    }

    [Fact]
    public void Save_exits_with_the_verdict_it_records()
    {
        var (missed, _, _) = CliRunner.Run("save", RepoFiles.TempPlant(MissesDamping));
        var (met, _, _) = CliRunner.Run("save", RepoFiles.TempPlant(MeetsDamping));
        Assert.Equal(1, missed);
        Assert.Equal(0, met);
    }

    [Fact]
    public void Response_names_the_specs_missed_at_its_values_in_text_and_json()
    {
        string file = RepoFiles.TempPlant(MissesDamping);
        var (_, text, _) = CliRunner.Run("response", file);
        Assert.Contains("specs at these values: ! missed min_damping", text, StringComparison.Ordinal);
        var (code, json, _) = CliRunner.Run("response", file, "--json");
        Assert.Equal(1, code);
        using var doc = JsonDocument.Parse(json);
        Assert.False(doc.RootElement.GetProperty("specs_met").GetBoolean());
        Assert.True(doc.RootElement.GetProperty("stable").GetBoolean());
        Assert.Equal("min_damping", doc.RootElement.GetProperty("missed")[0].GetString());
    }

    [Fact]
    public void The_magnetic_bearing_fails_in_response_at_its_values_as_check_says()
    {
        // plants/magnetic-bearing.toml: t½ of the slow real pole is 0.0171 s at nominal, over the 0.01 s limit.
        var (code, stdout, _) = CliRunner.Run("response", RepoFiles.Plant("magnetic-bearing.toml"));
        Assert.Equal(1, code);
        Assert.Contains("missed max_time_to_half", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void Save_has_no_json_output_and_says_so_as_a_usage_error()
    {
        var (code, stdout, stderr) = CliRunner.Run("save", RepoFiles.TempPlant(MeetsDamping), "--json");
        Assert.Equal(2, code);
        Assert.Equal("", stdout);
        Assert.Contains("--json", stderr, StringComparison.Ordinal);
    }
}
