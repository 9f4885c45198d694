namespace TermLocus.Tests.Cli;

/// <summary>
/// Input a verb cannot honour ends in exit 2, one line on stderr and nothing on stdout, never a false verdict or a
/// stack trace (the command-line contract, ../shared/design/cli.md).
/// </summary>
public class InputGuardTests
{
    private static string Conveyor => RepoFiles.Plant("conveyor-speed.toml");

    private static void AssertOneLineRefusal(int code, string stdout, string stderr, string expected)
    {
        Assert.Equal(2, code);
        Assert.Equal("", stdout);
        Assert.Single(stderr.TrimEnd('\n').Split('\n'));
        Assert.Contains(expected, stderr, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", stderr, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("check", "3")] // conveyor J has band [0.3, 0.65]; at J = 3 the nominal ζ is 0.27 < 0.5
    [InlineData("check", "1e9")]
    [InlineData("check", "0.29")]
    [InlineData("analyze", "3")]
    [InlineData("trace", "3")]
    [InlineData("plot", "3")]
    [InlineData("design", "3")]
    [InlineData("response", "3")]
    public void A_toleranced_value_set_outside_its_band_is_a_usage_error_in_every_verb(string verb, string value)
    {
        var (code, stdout, stderr) = CliRunner.Run(verb, Conveyor, "--set", "J=" + value);
        AssertOneLineRefusal(code, stdout, stderr, "outside the band [0.3, 0.65] of 'J'");
    }

    [Fact]
    public void Save_refuses_a_value_outside_the_band_and_leaves_the_file_alone()
    {
        string text = File.ReadAllText(Conveyor);
        string file = RepoFiles.TempPlant(text);
        var (code, stdout, stderr) = CliRunner.Run("save", file, "--set", "J=0.7");
        AssertOneLineRefusal(code, stdout, stderr, "outside the band");
        Assert.Equal(text, File.ReadAllText(file));
    }

    [Theory]
    [InlineData("0.3")]
    [InlineData("0.65")]
    public void The_band_ends_themselves_are_allowed(string value)
    {
        var (code, _, stderr) = CliRunner.Run("check", Conveyor, "--set", "J=" + value);
        Assert.True(code is 0 or 1, stderr);
    }

    [Fact]
    public void A_swept_value_outside_its_range_is_allowed_because_the_range_is_only_the_span_drawn()
    {
        // Kp's range is [0, 150]; the reader accepts a value outside it too. Kp = 1000 is far past the damping
        // boundary near 84.7 (analyze), so the check runs and fails.
        var (code, stdout, stderr) = CliRunner.Run("check", Conveyor, "--set", "Kp=1000");
        Assert.True(code == 1, stderr);
        Assert.Contains("verdict: FAIL", stdout, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("trace", "-1e308", "1e308", "wider than a double can hold")]
    [InlineData("analyze", "-1e308", "1e308", "wider than a double can hold")]
    [InlineData("design", "0", "1e306", "too wide")]
    [InlineData("trace", "0", "1e306", "too wide")]
    [InlineData("trace", "5", "5", "empty or reversed")]
    [InlineData("analyze", "9", "2", "empty or reversed")]
    public void A_span_that_cannot_be_traced_is_refused_in_one_line(string verb, string from, string to, string expected)
    {
        var (code, stdout, stderr) = CliRunner.Run(verb, Conveyor, "--from", from, "--to", to);
        AssertOneLineRefusal(code, stdout, stderr, expected);
    }

    [Fact]
    public void A_loop_given_by_its_characteristic_has_no_step_response_and_says_so_on_stderr_only()
    {
        // The reflow demo gives only its characteristic polynomial: there is no reference-to-output path to simulate.
        foreach (var json in new[] { false, true })
        {
            string[] args = json
                ? ["response", RepoFiles.Plant("reflow-oven-zone.toml"), "--json"]
                : ["response", RepoFiles.Plant("reflow-oven-zone.toml")];
            var (code, stdout, stderr) = CliRunner.Run(args);
            AssertOneLineRefusal(code, stdout, stderr, "reflow-oven-zone.toml:21:19: error: no step response");
        }
    }
}
