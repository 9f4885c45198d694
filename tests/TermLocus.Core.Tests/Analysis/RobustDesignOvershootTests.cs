using System.Globalization;
using MathNet.Numerics.RootFinding;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Analysis;

/// <summary>
/// The robust design with <c>max_overshoot_pct</c>, against closed forms of the step response's overshoot, a
/// textbook sampled loop, and dense sampling of the band check.
/// </summary>
public class RobustDesignOvershootTests
{
    /// <summary>
    /// A continuous loop's end sits where the simulated overshoot crosses the limit; the simulation's peak is a
    /// parabola through grid samples, which leaves the end about 2e-7 (relative) from the exact one at 10 %
    /// overshoot and 3e-6 at 15 % with a zero (measured); this allows about three times that.
    /// </summary>
    private const double SimulatedEnd = 1e-5;

    /// <summary>
    /// A sampled loop's figure is the plant output between samples, simulated exactly at 10 points a sample here, the
    /// peak a parabola through three of them; measured, the end is 1.1e-5 (relative) from the exact one (the instants
    /// alone would put it 1.5e-3 away); this allows about three times that.
    /// </summary>
    private const double BetweenSamplesEnd = 3e-5;

    private static DesignResult Design(string text)
    {
        var plant = PlantFileReader.Parse(text, "overshoot-test.toml");
        return RobustDesign.Find(LoopModel.Create(plant), plant.NominalValues(), plant.SweptParameter.Range!.Value);
    }

    // K/(s(s + a)) with K swept over [0, highestGain] under the given [specs] lines.
    private static DesignResult DesignTypeOne(string title, double a, double highestGain, string specs) => Design(Invariant($$"""
        title = "{{title}}"
        [parameters]
        K = { value = 1.0, range = [0.0, {{highestGain:0.0}}] }
        a = {{a}}
        [loop]
        plant = "K/(s*(s + a))"
        sweep = "K"
        [specs]
        {{specs}}
        """));

    // Standard second-order overshoot 100·exp(−πζ/√(1−ζ²)) (Ogata, Modern Control Engineering, 5th ed., Sec. 5-3,
    // from memory), solved for ζ: ζ = −ln(M)/√(π² + ln²(M)), M = overshoot/100.
    private static double DampingFor(double overshootPct)
    {
        double l = Math.Log(overshootPct / 100.0);
        return -l / Math.Sqrt((Math.PI * Math.PI) + (l * l));
    }

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);

    [Fact]
    public void A_ten_percent_limit_ends_the_interval_at_the_handbook_gain_of_a_second_order_loop()
    {
        // K/(s(s + a)) closes to K/(s^2 + a s + K): ωn = √K, ζ = a/(2√K), so overshoot <= 10 % <=> K <= a^2/(4 ζ*^2).
        const double a = 2.0;
        var result = DesignTypeOne("second-order overshoot", a, 20.0, "max_overshoot_pct = 10");

        double zeta = DampingFor(10.0), upper = a * a / (4.0 * zeta * zeta); // 2.8615
        Assert.True(result.OvershootJudged);
        var interval = Assert.Single(result.Intervals);
        Assert.Equal(0.0, interval.From, 1e-9);
        Assert.Equal(upper, interval.To, SimulatedEnd * upper);
        Assert.Equal(["stability"], [.. interval.FromLimitedBy]);
        Assert.Equal(["max_overshoot_pct"], [.. interval.ToLimitedBy]);
        var recommended = Assert.IsType<DesignRecommendation>(result.Recommended);
        Assert.True(recommended.Confirmed);
        Assert.Equal("max_overshoot_pct", recommended.SmallestMargin.Spec);
    }

    [Fact]
    public void The_recommended_value_counts_the_overshoot_margin_with_the_pole_margins()
    {
        // As above with max_time_to_half = 1 s over K in [0, 80]. Complex poles (K >= 1) decay at σ = a/2 = 1 1/s, so
        // the time-to-half margin is (1 - ln2/1)/1 = 1 - ln2 for every K >= 1 and smaller below (real poles, the slow
        // one at σ = 1 - √(1 - K)). The overshoot margin (10 - OS)/10 falls from 1 at K = 1; it meets 1 - ln2 at
        // OS = 10 ln2 %. So the smallest margin is 1 - ln2 on [1, K(10 ln2 %)], a plateau whose middle is the
        // recommendation. Without the overshoot margin the plateau would reach 80.
        const double a = 2.0;
        var result = DesignTypeOne("second-order overshoot and decay", a, 80.0, "max_time_to_half = 1.0\nmax_overshoot_pct = 10");

        double ln2 = Math.Log(2.0);
        double lower = 1.0 - ((1.0 - ln2) * (1.0 - ln2));                      // σ = ln2: 0.9058
        double upper = a * a / (4.0 * Math.Pow(DampingFor(10.0), 2));           // 2.8615
        double plateauEnd = a * a / (4.0 * Math.Pow(DampingFor(10.0 * ln2), 2)); // 2.386
        var interval = Assert.Single(result.Intervals);
        Assert.Equal(lower, interval.From, 1e-9 * lower);
        Assert.Equal(upper, interval.To, SimulatedEnd * upper);
        Assert.Equal(["max_time_to_half"], [.. interval.FromLimitedBy]);
        Assert.Equal(["max_overshoot_pct"], [.. interval.ToLimitedBy]);
        var recommended = Assert.IsType<DesignRecommendation>(result.Recommended);
        Assert.Equal((1.0 + plateauEnd) / 2.0, recommended.Value, SimulatedEnd * plateauEnd);
        Assert.True(recommended.Confirmed);
        Assert.Equal(1.0 - ln2, recommended.SmallestMargin.RelativeMargin, 1e-9);
    }

    [Fact]
    public void A_zero_moves_the_overshoot_ends_far_from_where_the_damping_ratio_puts_them()
    {
        // K (s + b)/(s (s + a)), a = 1, b = 4, closes to K (s + b)/(s^2 + (a + K) s + K b): ωn^2 = K b,
        // ζ = (a + K)/(2 ωn), and a zero at -b, so y = y0 + y0'/b with y0 the standard second-order step response
        // (Franklin, Powell and Emami-Naeini, Feedback Control of Dynamic Systems, Sec. 3.5 on the effect of a zero,
        // from memory). ζ is smallest (0.5) at K = 1; the limit of 15 % leaves an infeasible band of K around it.
        var result = Design("""
            title = "second-order loop with a zero"
            [parameters]
            K = { value = 1.0, range = [0.0, 30.0] }
            a = 1.0
            b = 4.0
            [loop]
            plant = "K*(s + b)/(s*(s + a))"
            sweep = "K"
            [specs]
            max_overshoot_pct = 15
            """);

        double first = Brent.FindRoot(k => OvershootWithZero(k, 1.0, 4.0) - 15.0, 0.1, 1.0, 1e-14);  // 0.49
        double second = Brent.FindRoot(k => OvershootWithZero(k, 1.0, 4.0) - 15.0, 2.0, 7.0, 1e-14); // 6.0
        Assert.Equal(2, result.Intervals.Length);
        Assert.Equal(first, result.Intervals[0].To, SimulatedEnd * first);
        Assert.Equal(second, result.Intervals[1].From, SimulatedEnd * second);
        Assert.Equal(30.0, result.Intervals[1].To);
        Assert.Equal(["max_overshoot_pct"], [.. result.Intervals[0].ToLimitedBy]);
        Assert.Equal(["max_overshoot_pct"], [.. result.Intervals[1].FromLimitedBy]);
        Assert.True(result.Recommended!.Confirmed);
        Assert.InRange(result.Recommended.Value, second, 30.0);

        // The damping ratio alone (the handbook formula without the zero) would end the band at 0.65 and 1.55.
        double zeta = DampingFor(15.0), root = Math.Sqrt((zeta * zeta * 4.0) - 1.0);
        double zetaFirst = Math.Pow((zeta * 2.0) - root, 2), zetaSecond = Math.Pow((zeta * 2.0) + root, 2);
        Assert.True(zetaFirst / first > 1.15, $"{zetaFirst} against {first}");
        Assert.True(second / zetaSecond > 3.0, $"{zetaSecond} against {second}");
    }

    [Fact]
    public void A_sampled_loop_ends_where_its_plant_output_between_samples_reaches_the_limit()
    {
        // K/(s(s + 1)) behind a zero-order hold, T = 1 s, controller u_k = K (1 - y_k). Over one sample the plant
        // ÿ + ẏ = u with u held has the closed form v(τ) = v_k e^-τ + u (1 - e^-τ), y(τ) = y_k + v_k (1 - e^-τ)
        // + u (τ - 1 + e^-τ) (common practice), written out below; the largest output between samples is where v = 0,
        // e^-τ = u/(u - v_k). The check, and so the design, judge that output, not only the instants.
        var result = Design("""
            title = "sampled textbook loop"
            [parameters]
            K = { value = 1.0, range = [0.0, 2.0] }
            [loop]
            plant = "1/(s*(s + 1))"
            controller = "K"
            sample_time = 1.0
            sweep = "K"
            [specs]
            max_overshoot_pct = 20
            """);

        // The instants reproduce the book's response at K = 1: c(k) = 0, 0.3679, 1.0000, 1.3996, 1.3996, 1.1470,
        // 0.8944, 0.8015 (Ogata, Discrete-Time Control Systems, 2nd ed., Ch. 4, from memory; four decimals), whose
        // peak lies between the instants 3 and 4.
        double[] book = [0.0, 0.3679, 1.0, 1.3996, 1.3996, 1.1470, 0.8944, 0.8015];
        var (instants, peak) = HeldResponse(1.0, 200);
        Assert.All(book.Zip(instants), pair => Assert.Equal(pair.First, pair.Second, 5e-5));
        Assert.True(peak > 1.3996 + 1e-3, $"peak {peak}");

        double end = Bisection.FindRoot(k => (100.0 * (HeldResponse(k, 200).Peak - 1.0)) - 20.0, 0.3, 1.0, 1e-14);
        var interval = Assert.Single(result.Intervals);
        Assert.Equal(end, interval.To, BetweenSamplesEnd * end);
        Assert.Equal(["max_overshoot_pct"], [.. interval.ToLimitedBy]);
        Assert.True(result.Recommended!.Confirmed);
    }

    [Fact]
    public void With_a_toleranced_pole_the_intervals_are_where_the_band_check_passes()
    {
        // K/(s(s + a)) with a = 2 ± 20 %: the lightest damping, and the most overshoot, is at a = 1.6, the slowest
        // complex decay too. The band check (corners and interior search) is run at 1201 gains across the span.
        const string text = """
            title = "banded overshoot"
            [parameters]
            K = { value = 1.0, range = [0.0, 6.0] }
            a = { value = 2.0, tolerance_pct = 20 }
            [loop]
            plant = "K/(s*(s + a))"
            sweep = "K"
            [specs]
            max_time_to_half = 1.2
            max_overshoot_pct = 10
            """;
        var plant = PlantFileReader.Parse(text, "banded.toml");
        var model = LoopModel.Create(plant);
        var result = RobustDesign.Find(model, plant.NominalValues(), new Interval(0.0, 6.0));

        double upper = 1.6 * 1.6 / (4.0 * Math.Pow(DampingFor(10.0), 2)); // 1.831, closed form at a = 1.6
        var interval = Assert.Single(result.Intervals);
        Assert.Equal(upper, interval.To, SimulatedEnd * upper);
        for (int i = 0; i <= 1200; i++)
        {
            double k = 6.0 * i / 1200;
            bool inside = k >= interval.From && k <= interval.To;
            bool nearEnd = Math.Abs(k - interval.From) < 1e-6 || Math.Abs(k - interval.To) < 1e-6 * interval.To;
            if (!nearEnd)
            {
                Assert.True(inside == LoopCheck.Run(model, plant.NominalValues().SetItem("K", k)).Passed, $"K = {k}");
            }
        }
    }

    // Overshoot in percent of K (s + b)/(s^2 + (a + K) s + K b), underdamped: the first peak is where y0' + y0''/b = 0,
    // i.e. (b - σ) sin θ + ωd cos θ = 0 with θ = ωd t, so θ = π - atan2(ωd, b - σ).
    private static double OvershootWithZero(double k, double a, double b)
    {
        double wn = Math.Sqrt(k * b), zeta = (a + k) / (2.0 * wn);
        double sigma = zeta * wn, wd = wn * Math.Sqrt(1.0 - (zeta * zeta));
        double theta = Math.PI - Math.Atan2(wd, b - sigma), t = theta / wd, decay = Math.Exp(-sigma * t);
        double y0 = 1.0 - (decay * (Math.Cos(theta) + (sigma / wd * Math.Sin(theta))));
        double slope = wn / Math.Sqrt(1.0 - (zeta * zeta)) * decay * Math.Sin(theta);
        return 100.0 * (y0 + (slope / b) - 1.0);
    }

    // The output at the instants k = 0 .. count - 1 and the largest output over that time, instants and between.
    private static (double[] Instants, double Peak) HeldResponse(double k, int count)
    {
        var instants = new double[count];
        double y = 0.0, v = 0.0, peak = 0.0;
        for (int n = 0; n < count; n++)
        {
            instants[n] = y;
            peak = Math.Max(peak, y);
            double u = k * (1.0 - y), stop = u / (u - v);
            if (v > 0.0 && u < 0.0 && stop > Math.Exp(-1.0) && stop < 1.0)
            {
                double tau = -Math.Log(stop);
                peak = Math.Max(peak, y + (v * (1.0 - stop)) + (u * (tau - 1.0 + stop)));
            }

            double e = Math.Exp(-1.0);
            (y, v) = (y + (v * (1.0 - e)) + (u * e), (v * e) + (u * (1.0 - e)));
        }

        return (instants, peak);
    }
}
