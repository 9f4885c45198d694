using System.Globalization;
using System.Numerics;
using TermLocus.App.Text;
using TermLocus.App.Workbench;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Workbench;

public class OvershootWordingTests
{
    [Fact]
    public void A_band_overshoot_miss_on_the_status_line_names_the_figure_and_the_corner_not_a_pole()
    {
        // K/(s(s + a)) at K = 5: at the corner a = 1.6, ζ = 1.6/(2√5) = 0.3578 and the step overshoot is
        // 100·exp(-πζ/√(1 - ζ²)) = 30.01 % (Ogata, Modern Control Engineering, 5th ed., §5-3; from memory).
        var session = BandPlants.Opened(BandPlants.Quadratic(5, new Specs(MaxOvershootPct: 25))).Session!;
        string verdict = StatusLinePresenter.Verdict(session, Glyphs.Unicode);
        const string Head = "! in band: max_overshoot_pct: step response overshoot ";
        Assert.StartsWith(Head, verdict, StringComparison.Ordinal);
        string figure = verdict[Head.Length..].Split(' ')[0];
        double zeta = 1.6 / (2 * Math.Sqrt(5));
        Assert.Equal(100 * Math.Exp(-Math.PI * zeta / Math.Sqrt(1 - zeta * zeta)), double.Parse(figure, CultureInfo.InvariantCulture), 0.05);
        Assert.Contains(" % > 25 % with a -20 %", verdict, StringComparison.Ordinal);
        Assert.DoesNotContain("±", verdict, StringComparison.Ordinal);
    }

    [Fact]
    public void A_response_that_does_not_settle_is_said_so_without_a_pole()
    {
        var miss = new SpecMiss("max_overshoot_pct", 25, null, double.NegativeInfinity, new Complex(-0.5, 1));
        Assert.Equal("max_overshoot_pct 25 %: the step response does not settle", SpecWording.Violation(miss, Glyphs.Ascii));
    }

    [Fact]
    public void Pole_limits_keep_their_pole_wording()
    {
        var miss = new SpecMiss("min_damping", 0.6, 0.42, -0.18, new Complex(-1.2, 2.6));
        Assert.Equal("min_damping: ζ 0.4200 < 0.6 at -1.200 ± j2.600", SpecWording.Violation(miss, Glyphs.Unicode));
    }
}
