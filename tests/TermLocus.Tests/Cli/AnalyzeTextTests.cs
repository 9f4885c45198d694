using System.Text.RegularExpressions;

namespace TermLocus.Tests.Cli;

/// <summary>What analyze prints for the demo plants: numbers in one spelling, and only real spec boundaries.</summary>
public partial class AnalyzeTextTests
{
    [GeneratedRegex(@"[0-9]E[-+]?[0-9]")]
    private static partial Regex CapitalExponent();

    [Fact]
    public void The_sampled_servo_is_stable_from_zero_gain_and_prints_no_capital_exponent()
    {
        // plants/digital-servo-axis.toml: the held integrator's root sits on the unit circle at z = 1 when Kp = 0 and
        // moves inside for any Kp > 0 (common practice), so the stable range starts at the span start, 0.
        var (code, stdout, _) = CliRunner.Run("analyze", RepoFiles.Plant("digital-servo-axis.toml"));
        Assert.Equal(0, code);
        Assert.Contains("stable for Kp in [0, 1000]", stdout, StringComparison.Ordinal);
        Assert.DoesNotMatch(CapitalExponent(), stdout);
    }

    [Theory]
    [InlineData("magnetic-bearing.toml", "at Kp = 2000,")] // a real pole crosses the origin there: the stability crossing
    [InlineData("conveyor-speed.toml", "at Kp = 0,")] // the integrator's pole sits at the origin at Kp = 0
    public void A_pole_at_the_origin_is_no_damping_boundary(string plant, string notThere)
    {
        var (_, stdout, _) = CliRunner.Run("analyze", RepoFiles.Plant(plant));
        var damping = stdout.Split('\n').Where(l => l.Contains("min_damping boundary", StringComparison.Ordinal)).ToList();
        Assert.NotEmpty(damping);
        Assert.DoesNotContain(damping, l => l.Contains(notThere, StringComparison.Ordinal));
    }

    [Fact]
    public void The_magnetic_bearing_still_reports_its_stability_crossing_at_the_origin()
    {
        var (_, stdout, _) = CliRunner.Run("analyze", RepoFiles.Plant("magnetic-bearing.toml"));
        Assert.Contains("imaginary-axis crossing at j0 rad/s, Kp = 2000", stdout, StringComparison.Ordinal);
        Assert.Contains("stable for Kp in [2000, 10820.2]", stdout, StringComparison.Ordinal);
    }
}
