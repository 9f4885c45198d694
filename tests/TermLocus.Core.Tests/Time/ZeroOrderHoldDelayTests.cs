using TermLocus.Core.Algebra;
using TermLocus.Core.Time;

namespace TermLocus.Core.Tests.Time;

public class ZeroOrderHoldDelayTests
{
    private const double Tight = 1e-12;

    [Fact]
    public void Fractional_delay_of_a_first_order_lag_gives_the_modified_z_transform()
    {
        // 1/(s + a), delay τ in (0, T): ((1 − e^{−a(T−τ)})z + e^{−a(T−τ)} − e^{−aT}) / (a z (z − e^{−aT}))
        // (G. F. Franklin, J. D. Powell, M. Workman, Digital Control of Dynamic Systems, 3rd ed., §4.3.4, from memory).
        const double a = 3.0, t = 0.2, tau = 0.07;
        var gz = ZeroOrderHold.Discretise(Lag(a), t, tau);
        double late = Math.Exp(-a * (t - tau)), full = Math.Exp(-a * t);
        AssertCoefficients([(late - full) / a, (1 - late) / a], gz.Numerator);
        AssertCoefficients([0, -full, 1], gz.Denominator);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(0.31)]
    [InlineData(2.37)]
    [InlineData(4.0)]
    public void A_delayed_equivalent_reproduces_the_delayed_step_response_at_the_samples(double delayInSamples)
    {
        // Step invariance holds for G(s)e^{−sτ} too (definition of the hold equivalent); the open-loop delayed step
        // response is the undelayed one shifted by τ, which StepResponse computes exactly.
        var g = new RationalFunction(
            Polynomial.FromAscending(3, 1),
            Polynomial.FromAscending(2, 1) * Polynomial.FromAscending(5, 0.4, 1));
        const double t = 0.05;
        double tau = delayInSamples * t;
        var sampled = StepResponse.SimulateSampled(ZeroOrderHold.Discretise(g, t, tau), t, 200);
        var continuous = StepResponse.Simulate(g, t * 199, 200, tau);
        for (int k = 0; k < 200; k++)
        {
            Assert.Equal(continuous.Outputs[k], sampled.Outputs[k], 1e-11);
        }
    }

    [Fact]
    public void Whole_sample_delays_raise_the_denominator_and_snap_to_the_grid()
    {
        // e^{−3sT} = z^{−3} after the hold (shift theorem, common practice). 3 × 0.1 is 0.30000000000000004 in
        // doubles; it must count as three whole samples, not two and a remainder.
        const double t = 0.1;
        var plain = ZeroOrderHold.Discretise(Lag(1.0), t);
        var delayed = ZeroOrderHold.Discretise(Lag(1.0), t, 3 * t);
        AssertCoefficients([.. plain.Numerator.Coefficients], delayed.Numerator);
        AssertCoefficients([.. (plain.Denominator * Polynomial.FromAscending(0, 0, 0, 1)).Coefficients], delayed.Denominator);
    }

    [Fact]
    public void A_static_gain_with_a_fractional_delay_is_one_more_sample_late()
    {
        // y(kT) = D·u(kT − τ) with the input held: for 1.5 samples that is u[k − 2] (by hand).
        var gz = ZeroOrderHold.Discretise(RationalFunction.Constant(4.0), 1.0, 1.5);
        AssertCoefficients([4.0], gz.Numerator);
        AssertCoefficients([0, 0, 1], gz.Denominator);
    }

    [Fact]
    public void Bad_delays_are_refused()
    {
        Assert.Throws<ArgumentException>(() => ZeroOrderHold.Discretise(Lag(1.0), 0.1, -0.01));
        Assert.Throws<ArgumentException>(() => ZeroOrderHold.Discretise(Lag(1.0), 0.1, double.NaN));
        Assert.False(ZeroOrderHold.TryDiscretise(Lag(1.0), 0.001, 2.0, out _, out var error));
        Assert.Contains("1000", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Sampled_grid_covers_eight_slow_time_constants_one_sample_each()
    {
        // Ogata's sampled motor loop at K = 1 (closed loop (0.3679z + 0.2642)/(z² − z + 0.6321), Discrete-Time Control
        // Systems, 2nd ed., ch. 4, from memory): |z| = 0.7951, σ = 0.2293 1/s, 8/σ = 34.9 s at T = 1 s → 36 samples.
        double e = Math.Exp(-1);
        var closed = new RationalFunction(Polynomial.FromAscending(1 - (2 * e), e), Polynomial.FromAscending(1 - e, -1, 1));
        var grid = ResponseGrid.ForSampled(closed, 1.0);
        Assert.Equal(36, grid.Samples);
        Assert.Equal(35.0, grid.DurationSeconds, Tight);

        // A deadbeat loop (all poles at z = 0) sets no time scale: degree + 20 samples.
        var deadbeat = new RationalFunction(Polynomial.One, Polynomial.FromAscending(0, 0, 1));
        Assert.Equal(23, ResponseGrid.ForSampled(deadbeat, 0.5).Samples);
        Assert.Throws<ArgumentException>(() => ResponseGrid.ForSampled(closed, 0.0));
    }

    [Fact]
    public void Sampled_figures_take_the_largest_sample_as_the_peak()
    {
        // Samples 0, 0.3679, 1, 1.3996, 1.3996, 1.147 (Ogata, as above): the peak is 1.3996 at the 3rd sample; a
        // parabola through samples 2..4 would invent 1.4496 at 3.5 s.
        double[] y = [0, 0.3679, 1.0, 1.3996, 1.3996, 1.147];
        var trace = new ResponseTrace([0, 1, 2, 3, 4, 5], [.. y]);
        var figures = StepFigures.FromSamples(trace, 1.0)!;
        Assert.Equal(39.96, figures.OvershootPct!.Value, 1e-9);
        Assert.Equal(3.0, figures.PeakTimeSeconds!.Value, Tight);
        Assert.True(StepFigures.From(trace, 1.0)!.OvershootPct > 40.0);
    }

    private static RationalFunction Lag(double a) => new(Polynomial.One, Polynomial.FromAscending(a, 1));

    private static void AssertCoefficients(double[] expected, Polynomial actual)
    {
        Assert.Equal(expected.Length - 1, actual.Degree);
        for (int k = 0; k < expected.Length; k++)
        {
            Assert.Equal(expected[k], actual[k], Tight);
        }
    }
}
