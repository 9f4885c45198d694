using System.Collections.Immutable;
using System.Globalization;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Analysis;

public class RobustDesignTests
{
    // Second-order loop m s^2 + c s + (k + Kp), Kp swept, m toleranced ±20 % around 1 (band [0.8, 1.2]), c = 4, k = 2.
    // Closed forms (common practice: the standard second-order form s^2 + 2ζωn s + ωn^2, K' = k + Kp):
    //   complex poles (c^2 < 4 m K'): σ = c/(2m), ωn = sqrt(K'/m), ζ = c / (2 sqrt(m K'));
    //   real poles: ζ = 1 for both (if K' > 0), the slow one σ = (c - sqrt(c^2 - 4 m K')) / (2m).
    // ζ >= ζmin  <=>  K' <= c^2 / (4 m ζmin^2): the worst corner is m_max, so Kp <= c^2/(4 m_max ζmin^2) - k.
    // σ >= σmin (real case, needs σmin <= c/(2m)): sqrt(c^2 - 4mK') <= c - 2mσmin  <=>  K' >= σmin (c - m σmin),
    // largest at m_min, so Kp >= σmin (c - m_min σmin) - k. In the complex case σ = c/(2m) whatever Kp, and the slow
    // real pole is never faster than that, so σmin > c/(2 m_max) leaves no feasible value at all.
    // Below Kp = -k a real pole is positive (ζ = -1, unstable); at Kp = -k it sits at the origin.
    private const double C = 4.0, K = 2.0, MLow = 0.8, MHigh = 1.2;

    private static string SecondOrder(string specs, double from = -5.0, double to = 30.0) =>
        string.Create(CultureInfo.InvariantCulture, $$"""
        title = "second-order closed form"
        [parameters]
        Kp = { value = 3.0, range = [{{from}}, {{to}}] }
        m = { value = 1.0, tolerance_pct = 20 }
        c = {{C}}
        k = {{K}}
        [loop]
        characteristic = "m*s^2 + c*s + (k + Kp)"
        sweep = "Kp"
        [specs]
        {{specs}}
        """);

    private static DesignResult Design(string text, Interval? span = null)
    {
        var plant = PlantFileReader.Parse(text, "design-test.toml");
        var model = LoopModel.Create(plant);
        return RobustDesign.Find(model, plant.NominalValues(), span ?? plant.SweptParameter.Range!.Value);
    }

    [Fact]
    public void Min_damping_alone_bounds_the_gain_above_by_the_heaviest_mass_and_below_by_stability()
    {
        var result = Design(SecondOrder("min_damping = 0.5"));

        double upper = (C * C / (4.0 * MHigh * 0.25)) - K; // 11.333...
        var interval = Assert.Single(result.Intervals);
        Assert.Equal(-K, interval.From, 1e-9 * K);
        Assert.Equal(upper, interval.To, 1e-9 * upper);
        Assert.Equal(["min_damping", "stability"], [.. interval.FromLimitedBy]);
        Assert.Equal(["min_damping"], [.. interval.ToLimitedBy]);
        Assert.Equal(["min_damping", "stability"], [.. interval.LimitedBy]);
        Assert.Equal(3, result.PointsChecked);
        var recommended = Assert.IsType<DesignRecommendation>(result.Recommended);
        Assert.InRange(recommended.Value, interval.From, interval.To);
        Assert.True(recommended.Confirmed);
    }

    [Fact]
    public void Min_decay_rate_alone_bounds_the_gain_below_by_the_lightest_mass_real_root_case()
    {
        var result = Design(SecondOrder("min_decay_rate = 1.0"));

        double lower = (1.0 * (C - (MLow * 1.0))) - K; // 1.2
        var interval = Assert.Single(result.Intervals);
        Assert.Equal(lower, interval.From, 1e-9 * lower);
        Assert.Equal(30.0, interval.To); // the complex case keeps σ = c/(2m) >= 4/2.4 for every larger Kp
        Assert.Equal(["min_decay_rate"], [.. interval.FromLimitedBy]);
        Assert.Empty(interval.ToLimitedBy);
    }

    [Fact]
    public void Damping_and_decay_rate_together_give_a_two_sided_interval_and_the_closed_form_best_value()
    {
        var result = Design(SecondOrder("min_damping = 0.7\nmin_decay_rate = 1.0"));

        double lower = (1.0 * (C - (MLow * 1.0))) - K;             // 1.2
        double upper = (C * C / (4.0 * MHigh * 0.49)) - K;          // 4.8027...
        var interval = Assert.Single(result.Intervals);
        Assert.Equal(lower, interval.From, 1e-9 * lower);
        Assert.Equal(upper, interval.To, 1e-9 * upper);
        Assert.Equal(["min_decay_rate", "min_damping"], [.. interval.LimitedBy]);

        // The best value maximises the smallest relative margin over m in {0.8, 1, 1.2}; found independently by
        // MathNet's golden-section minimiser on the closed forms above.
        double best = MathNet.Numerics.FindMinimum.OfScalarFunctionConstrained(
            kp => -SmallestRelativeMargin(kp, 0.7, 1.0), lower, upper, 1e-10);
        var recommended = Assert.IsType<DesignRecommendation>(result.Recommended);
        // Rounded to RecommendedDigits (6) significant digits: within half a unit of the sixth digit.
        Assert.Equal(best, recommended.Value, 0.5e-5 * best);
        Assert.Equal(recommended.Value, double.Parse(recommended.Value.ToString("G6", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture), 0.0);
        Assert.True(recommended.Confirmed);
        // The worst point of the band for both limits is a corner, so the full check agrees with the closed form.
        Assert.Equal(SmallestRelativeMargin(recommended.Value, 0.7, 1.0), recommended.SmallestMargin.RelativeMargin, 1e-9);
        Assert.True(recommended.SmallestMargin.AtCorner);
    }

    [Fact]
    public void A_decay_rate_above_what_the_heaviest_mass_can_reach_leaves_no_interval()
    {
        // σ can never exceed c/(2m) = 4/2.4 = 1.67 1/s at m_max.
        var result = Design(SecondOrder("min_decay_rate = 1.8"));

        Assert.Empty(result.Intervals);
        Assert.False(result.Feasible);
        Assert.Null(result.Recommended);
    }

    [Fact]
    public void A_conditionally_stable_loop_has_two_stable_intervals_solved_by_routh_hurwitz()
    {
        // Loop K (s^2 + s + b)/(s^3 + s^2 + s + 0.5), b = 5 ± 10 %: P = s^3 + (1+K)s^2 + (1+K)s + (0.5 + bK).
        // Routh–Hurwitz for a cubic a3 s^3 + a2 s^2 + a1 s + a0 (Ogata, Modern Control Engineering, 5th ed.,
        // Sec. 5-6, from memory): stable iff every a_i > 0 and a2 a1 > a3 a0, i.e. (1+K)^2 > 0.5 + bK,
        // K^2 + (2 - b) K + 0.5 > 0: unstable between the roots ((b-2) ± sqrt((b-2)^2 - 2))/2, a gap that widens
        // with b, so the corner b = 5.5 sets both ends.
        const string text = """
            title = "conditionally stable"
            [parameters]
            K = { value = 1.0, range = [0.0, 6.0] }
            b = { value = 5.0, tolerance_pct = 10 }
            [loop]
            plant = "(s^2 + s + b)/(s^3 + s^2 + s + 0.5)"
            controller = "K"
            sweep = "K"
            """;
        var result = Design(text);

        double d = 5.5 - 2.0, root = Math.Sqrt((d * d) - 2.0);
        double r1 = (d - root) / 2.0, r2 = (d + root) / 2.0;
        Assert.Equal(2, result.Intervals.Length);
        Assert.Equal(0.0, result.Intervals[0].From);
        Assert.Equal(r1, result.Intervals[0].To, 1e-9 * r1);
        Assert.Equal(r2, result.Intervals[1].From, 1e-9 * r2);
        Assert.Equal(6.0, result.Intervals[1].To);
        Assert.Equal(["stability"], [.. result.Intervals[0].LimitedBy]);
        Assert.Equal(["stability"], [.. result.Intervals[1].LimitedBy]);
        var recommended = Assert.IsType<DesignRecommendation>(result.Recommended);
        Assert.InRange(recommended.Value, r2, 6.0); // the wider interval
        Assert.Equal(DesignMargin.StabilityKey, recommended.SmallestMargin.Spec);
        Assert.True(recommended.SmallestMargin.Margin > 0.0);
    }

    [Fact]
    public void A_sampled_loop_without_specs_is_feasible_on_its_jury_stable_interval()
    {
        // K/(s(s+1)) behind a zero-order hold, T = 1 s: G(z) = K (e^-1 z + 1 - 2e^-1) / ((z - 1)(z - e^-1)), so
        // P(z) = z^2 + (K e^-1 - 1 - e^-1) z + e^-1 + K (1 - 2e^-1). Jury's test (Ogata, Discrete-Time Control
        // Systems, 2nd ed., Sec. 4-3, from memory): P(1) = K (1 - e^-1) > 0 gives K > 0, |a0| < 1 gives
        // K < (1 - e^-1)/(1 - 2e^-1) = (e - 1)/(e - 2), P(-1) > 0 only K < 26.3.
        const string text = """
            title = "sampled textbook loop"
            [parameters]
            K = { value = 1.0, range = [0.0, 5.0] }
            [loop]
            plant = "1/(s*(s + 1))"
            controller = "K"
            sample_time = 1.0
            sweep = "K"
            """;
        var result = Design(text);

        double upper = (Math.E - 1.0) / (Math.E - 2.0);
        var interval = Assert.Single(result.Intervals);
        Assert.Equal(0.0, interval.From, 1e-9);
        Assert.Equal(upper, interval.To, 1e-9 * upper);
        Assert.Equal(["stability"], [.. interval.FromLimitedBy]);
        Assert.Equal(["stability"], [.. interval.ToLimitedBy]);
        Assert.True(result.Recommended!.Confirmed);
    }

    [Fact]
    public void A_narrow_interval_between_two_boundaries_is_found_although_it_is_far_below_a_grid_step()
    {
        // As above with ζ >= 0.7 and σ >= 1 but the span stretched to [-5, 100000]: the interval [1.2, 4.80] is
        // 1.4e-5 of the span, about 1/180 of a grid step; the solved boundaries bracket it.
        var result = Design(SecondOrder("min_damping = 0.7\nmin_decay_rate = 1.0", -5.0, 100000.0));

        var interval = Assert.Single(result.Intervals);
        Assert.Equal(1.2, interval.From, 1e-9 * 1.2);
        Assert.Equal((C * C / (4.0 * MHigh * 0.49)) - K, interval.To, 1e-9 * 4.8);
    }

    [Fact]
    public void The_nominal_point_counts_when_it_lies_outside_the_band()
    {
        // m = 1.5 with band [0.8, 1.2] (an override outside the band): ζ at m = 1.5 bounds Kp lower than the corners.
        var plant = PlantFileReader.Parse(SecondOrder("min_damping = 0.5").Replace("tolerance_pct = 20", "band = [0.8, 1.2]", StringComparison.Ordinal), "t.toml");
        var values = plant.NominalValues().SetItem("m", 1.5);
        var result = RobustDesign.Find(LoopModel.Create(plant), values, new Interval(-5.0, 30.0));

        double upper = (C * C / (4.0 * 1.5 * 0.25)) - K;
        Assert.Equal(upper, Assert.Single(result.Intervals).To, 1e-9 * upper);
    }

    [Fact]
    public void An_empty_span_is_refused()
    {
        var plant = PlantFileReader.Parse(SecondOrder("min_damping = 0.5"), "t.toml");
        Assert.Throws<ArgumentException>(() =>
            RobustDesign.Find(LoopModel.Create(plant), ImmutableDictionary<string, double>.Empty, new Interval(3.0, 3.0)));
    }

    // Smallest relative margin over m in {0.8, 1, 1.2} of ζ >= zetaMin and σ >= sigmaMin, from the closed forms.
    private static double SmallestRelativeMargin(double kp, double zetaMin, double sigmaMin)
    {
        double smallest = double.PositiveInfinity;
        foreach (double m in new[] { MLow, 1.0, MHigh })
        {
            double kk = K + kp, disc = (C * C) - (4.0 * m * kk);
            double zeta = disc >= 0.0 ? 1.0 : C / (2.0 * Math.Sqrt(m * kk));
            double sigma = disc >= 0.0 ? (C - Math.Sqrt(disc)) / (2.0 * m) : C / (2.0 * m);
            smallest = Math.Min(smallest, Math.Min((zeta - zetaMin) / zetaMin, (sigma - sigmaMin) / sigmaMin));
        }

        return smallest;
    }
}
