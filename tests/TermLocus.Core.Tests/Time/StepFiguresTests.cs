using TermLocus.Core.Algebra;
using TermLocus.Core.Time;

namespace TermLocus.Core.Tests.Time;

public class StepFiguresTests
{
    [Fact]
    public void Second_order_loop_with_damping_one_half_overshoots_16_3_percent()
    {
        // ζ = 0.5, ωn = 1: Mp = 100·exp(−ζπ/√(1−ζ²)) = 16.303 %, tp = π/ωd = 3.6276 s
        // (K. Ogata, Modern Control Engineering, 5th ed., §5-3, from memory). Automatic grid.
        var analysis = StepResponseAnalysis.Of(StepResponseTests.SecondOrder(0.5, 1.0));
        var figures = analysis.Figures!;
        Assert.Equal(1.0, analysis.SteadyState!.Value, 1e-15);
        Assert.Equal(100 * Math.Exp(-0.5 * Math.PI / Math.Sqrt(0.75)), figures.OvershootPct!.Value, 1e-3);
        Assert.Equal(16.303, figures.OvershootPct!.Value, 1e-3);
        Assert.Equal(Math.PI / Math.Sqrt(0.75), figures.PeakTimeSeconds!.Value, 1e-3);
    }

    [Theory]
    [InlineData(0.5, 1.0, 501)]
    [InlineData(0.5, 1.0, 20001)]
    [InlineData(0.2, 5.0, 4001)]
    public void Rise_and_settling_times_match_the_analytic_response(double zeta, double wn, int samples)
    {
        // Crossing times of y = 1 − e^{−ζωn t}/√(1−ζ²)·sin(ωd t + acos ζ) (Ogata, 5th ed., §5-3, from memory),
        // found by bisection on the formula. Interpolation on the grid errs by O(Δt²).
        double duration = 8.0 / (zeta * wn);
        var trace = StepResponse.Simulate(StepResponseTests.SecondOrder(zeta, wn), duration, samples);
        var figures = StepFigures.From(trace, 1.0)!;
        Func<double, double> y = t => 1 - (Math.Exp(-zeta * wn * t) / Math.Sqrt(1 - (zeta * zeta))
                                            * Math.Sin((wn * Math.Sqrt(1 - (zeta * zeta)) * t) + Math.Acos(zeta)));
        double dt = duration / (samples - 1);
        double tolerance = Math.Max(1e-9, 2.0 * dt * dt * wn);
        double rise = FirstCrossing(y, 0.9, duration) - FirstCrossing(y, 0.1, duration);
        Assert.Equal(rise, figures.RiseTimeSeconds!.Value, tolerance);
        Assert.Equal(LastOutside(y, 0.02, duration), figures.SettlingTime2PctSeconds!.Value, tolerance);
        Assert.Equal(LastOutside(y, 0.05, duration), figures.SettlingTime5PctSeconds!.Value, tolerance);
    }

    [Fact]
    public void First_order_lag_figures_are_the_textbook_multiples_of_tau()
    {
        // 1 − e^{−t/τ}: rise 10–90 % = τ·ln 9, settling 2 % = τ·ln 50, 5 % = τ·ln 20, no overshoot
        // (Ogata, Modern Control Engineering, 5th ed., §5-2, from memory).
        const double tau = 0.2;
        var trace = StepResponse.Simulate(StepResponseTests.Lag(tau), 2.0, 20001);
        var figures = StepFigures.From(trace, StepFigures.SteadyStateOf(StepResponseTests.Lag(tau)))!;
        Assert.Equal(tau * Math.Log(9), figures.RiseTimeSeconds!.Value, 1e-6);
        Assert.Equal(tau * Math.Log(50), figures.SettlingTime2PctSeconds!.Value, 1e-6);
        Assert.Equal(tau * Math.Log(20), figures.SettlingTime5PctSeconds!.Value, 1e-6);
        Assert.Equal(0.0, figures.OvershootPct!.Value, 0.0);
        Assert.Null(figures.PeakTimeSeconds);
    }

    [Fact]
    public void Negative_steady_state_gain_gives_the_same_figures_as_a_positive_one()
    {
        var negative = new RationalFunction(Polynomial.Constant(-3.0), Polynomial.FromAscending(1.0, 0.2));
        var trace = StepResponse.Simulate(negative, 2.0, 20001);
        var figures = StepFigures.From(trace, StepFigures.SteadyStateOf(negative))!;
        Assert.Equal(-3.0, figures.SteadyState, 1e-15);
        Assert.Equal(0.2 * Math.Log(9), figures.RiseTimeSeconds!.Value, 1e-6); // as above, from memory
    }

    [Fact]
    public void Unstable_loop_or_pole_at_the_origin_has_no_figures()
    {
        var unstable = new RationalFunction(Polynomial.One, Polynomial.FromAscending(-1, 1));
        var integrating = new RationalFunction(Polynomial.One, Polynomial.FromAscending(0, 1, 1));
        var undamped = new RationalFunction(Polynomial.One, Polynomial.FromAscending(1, 0, 1));
        Assert.Null(StepFigures.SteadyStateOf(unstable));
        Assert.Null(StepFigures.SteadyStateOf(integrating));
        Assert.Null(StepFigures.SteadyStateOf(undamped));
        var analysis = StepResponseAnalysis.Of(unstable);
        Assert.Null(analysis.Figures);
        Assert.Null(analysis.Estimate);
        Assert.True(analysis.Trace.Count >= ResponseGrid.MinimumAutomaticSamples);
    }

    [Fact]
    public void Response_not_yet_settled_has_no_settling_time()
    {
        var trace = StepResponse.Simulate(StepResponseTests.Lag(1.0), 3.0, 301);
        var figures = StepFigures.From(trace, 1.0)!;
        Assert.Null(figures.SettlingTime2PctSeconds); // 1 − e^{−3} = 0.95: still outside ±2 %
        Assert.NotNull(figures.RiseTimeSeconds);
    }

    [Fact]
    public void Zero_steady_state_leaves_the_relative_figures_empty()
    {
        // s/(s+1) settles to 0: percentages of 0 are undefined.
        var washout = new RationalFunction(Polynomial.X, Polynomial.FromAscending(1, 1));
        var figures = StepFigures.From(StepResponse.Simulate(washout, 5.0, 51), StepFigures.SteadyStateOf(washout))!;
        Assert.Equal(0.0, figures.SteadyState, 0.0);
        Assert.Null(figures.OvershootPct);
        Assert.Null(figures.RiseTimeSeconds);
    }

    [Fact]
    public void Mismatched_or_unordered_samples_are_refused()
    {
        Assert.Throws<ArgumentException>(() => StepFigures.From([0.0, 1.0], [0.0], 1.0));
        Assert.Throws<ArgumentException>(() => StepFigures.From([0.0, 0.0], [0.0, 1.0], 1.0));
        Assert.Null(StepFigures.From([0.0, 1.0], [0.0, 1.0], null));
    }

    [Fact]
    public void Sampled_steady_state_is_the_gain_at_z_equal_one()
    {
        // H(1) for a stable H(z) (final value theorem, Ogata, Discrete-Time Control Systems, 2nd ed., ch. 2, from memory).
        var h = new RationalFunction(Polynomial.FromAscending(0.1, 0.2), Polynomial.FromAscending(-0.5, 1));
        Assert.Equal(0.3 / 0.5, StepFigures.SteadyStateOfSampled(h)!.Value, 1e-15);
        var unstable = new RationalFunction(Polynomial.One, Polynomial.FromAscending(-1.5, 1));
        Assert.Null(StepFigures.SteadyStateOfSampled(unstable));
    }

    private static double FirstCrossing(Func<double, double> y, double level, double end)
    {
        const double step = 1e-3;
        for (double t = 0; t < end; t += step)
        {
            if (y(t + step) >= level)
            {
                return Bisect(y, level, t, t + step);
            }
        }

        throw new InvalidOperationException("no crossing");
    }

    private static double LastOutside(Func<double, double> y, double band, double end)
    {
        const double step = 1e-3;
        for (double t = end; t > 0; t -= step)
        {
            double v = y(t - step);
            if (Math.Abs(v - 1) > band)
            {
                return Bisect(y, v > 1 ? 1 + band : 1 - band, t - step, t);
            }
        }

        return 0.0;
    }

    private static double Bisect(Func<double, double> y, double level, double lo, double hi)
    {
        double sign = Math.Sign(y(lo) - level);
        for (int i = 0; i < 80; i++)
        {
            double mid = 0.5 * (lo + hi);
            if (Math.Sign(y(mid) - level) == sign)
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }

        return 0.5 * (lo + hi);
    }
}
