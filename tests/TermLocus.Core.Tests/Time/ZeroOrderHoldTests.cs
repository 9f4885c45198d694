using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Time;

namespace TermLocus.Core.Tests.Time;

public class ZeroOrderHoldTests
{
    private const double Tight = 1e-12;

    [Fact]
    public void First_order_lag_gives_the_table_entry()
    {
        // 1/(s + a) → (1 − e^{−aT}) / (a (z − e^{−aT})) (G. F. Franklin, J. D. Powell, M. Workman, Digital Control
        // of Dynamic Systems, 3rd ed., table of zero-order-hold equivalents, from memory).
        const double a = 2.0, t = 0.1;
        var gz = ZeroOrderHold.Discretise(new RationalFunction(Polynomial.One, Polynomial.FromAscending(a, 1)), t);
        AssertCoefficients([-Math.Exp(-a * t), 1], gz.Denominator);
        AssertCoefficients([(1 - Math.Exp(-a * t)) / a], gz.Numerator);
    }

    [Fact]
    public void Double_integrator_gives_the_table_entry()
    {
        // 1/s² → T²(z + 1) / (2 (z − 1)²) (Franklin, Powell & Workman, 3rd ed., same table, from memory).
        const double t = 0.5;
        var gz = ZeroOrderHold.Discretise(new RationalFunction(Polynomial.One, Polynomial.FromAscending(0, 0, 1)), t);
        AssertCoefficients([1, -2, 1], gz.Denominator);
        AssertCoefficients([t * t / 2, t * t / 2], gz.Numerator);
    }

    [Fact]
    public void Integrator_with_lag_gives_the_table_entry()
    {
        // 1/(s(s + 1)) → [(T − 1 + e^{−T}) z + (1 − e^{−T} − T e^{−T})] / ((z − 1)(z − e^{−T}))
        // (K. Ogata, Discrete-Time Control Systems, 2nd ed., ch. 3, z-transform table with hold, from memory).
        const double t = 1.0;
        double e = Math.Exp(-t);
        var gz = ZeroOrderHold.Discretise(Motor(), t);
        AssertCoefficients([e, -(1 + e), 1], gz.Denominator);
        AssertCoefficients([1 - e - (t * e), t - 1 + e], gz.Numerator);
    }

    [Fact]
    public void Sampled_loop_is_stable_below_the_critical_gain_and_unstable_above()
    {
        // K/(s(s + 1)), ZOH, T = 1 s; closed-loop characteristic polynomial
        // z² + (0.3679K − 1.3679) z + (0.3679 + 0.2642K). The Jury test's |a0| < 1 gives the critical gain
        // K = (1 − e^{−1})/(1 − 2e^{−1}) = (e − 1)/(e − 2) = 2.39221 (worked here by hand; the example is in
        // K. Ogata, Discrete-Time Control Systems, 2nd ed., ch. 4, from memory; the other conditions give 0 < K < 26.4).
        double critical = (Math.E - 1) / (Math.E - 2);
        Assert.Equal(2.39221, critical, 1e-5);
        var gz = ZeroOrderHold.Discretise(Motor(), 1.0);
        Assert.True(LargestPoleModulus(gz, critical * 0.999) < 1.0);
        Assert.True(LargestPoleModulus(gz, critical * 1.001) > 1.0);
        Assert.True(LargestPoleModulus(gz, 0.01) < 1.0);

        // Bisection on the discretised loop alone finds the same gain.
        double lo = 0.5, hi = 5.0;
        for (int i = 0; i < 100; i++)
        {
            double mid = 0.5 * (lo + hi);
            (LargestPoleModulus(gz, mid) < 1.0 ? ref lo : ref hi) = mid;
        }

        Assert.Equal(critical, lo, 1e-9);
    }

    [Fact]
    public void Step_response_of_the_equivalent_matches_the_continuous_one_at_the_samples()
    {
        // Step invariance: the zero-order-hold equivalent reproduces y(kT) for a step input (definition).
        var g = new RationalFunction(
            Polynomial.FromAscending(3, 1),
            Polynomial.FromAscending(2, 1) * Polynomial.FromAscending(5, 0.4, 1));
        const double t = 0.05;
        var sampled = StepResponse.SimulateSampled(ZeroOrderHold.Discretise(g, t), t, 200);
        var continuous = StepResponse.Simulate(g, t * 199, 200);
        for (int k = 0; k < 200; k++)
        {
            Assert.Equal(continuous.Outputs[k], sampled.Outputs[k], 1e-11);
        }
    }

    [Theory]
    [InlineData(2, 1e-3)]
    [InlineData(3, 1e-3)]
    [InlineData(3, 1e-2)]
    [InlineData(5, 1e-2)]
    [InlineData(5, 1e-3)]
    public void Documented_accuracy_estimate_bounds_the_step_invariance_error(int order, double t)
    {
        // Π (s + i), i = 1..order, unit steady-state gain; the continuous response is exact, so any difference from the
        // equivalent's response is the z-polynomial form's error (step invariance: definition of the hold).
        var den = Polynomial.One;
        for (int i = 1; i <= order; i++)
        {
            den *= Polynomial.FromAscending(i, 1);
        }

        var g = new RationalFunction(Polynomial.Constant(den[0]), den);
        int samples = (int)(8.0 / t);
        var sampled = StepResponse.SimulateSampled(ZeroOrderHold.Discretise(g, t), t, samples);
        var continuous = StepResponse.Simulate(g, t * (samples - 1), samples);
        double worst = sampled.Outputs.Zip(continuous.Outputs, (a, b) => Math.Abs(a - b)).Max();
        Assert.InRange(worst, 0.0, ZeroOrderHold.AccuracyEstimate(g, t));
    }

    [Fact]
    public void Poles_map_by_the_exponential_and_feed_through_survives()
    {
        // (s + 2)/(s + 1) = 1 + 1/(s + 1) → 1 + (1 − e^{−T})/(z − e^{−T}) (table entry above plus the constant).
        const double t = 0.2;
        var gz = ZeroOrderHold.Discretise(new RationalFunction(Polynomial.FromAscending(2, 1), Polynomial.FromAscending(1, 1)), t);
        var z = new Complex(0.3, 0.7);
        var expected = 1 + ((1 - Math.Exp(-t)) / (z - Math.Exp(-t)));
        Assert.Equal(0.0, Complex.Abs(gz.Evaluate(z) - expected), Tight);
        Assert.Equal(Math.Exp(-t), PolynomialRoots.Find(gz.Denominator)[0].Real, Tight);
    }

    [Fact]
    public void Improper_function_or_bad_sample_time_is_refused()
    {
        var improper = new RationalFunction(Polynomial.FromAscending(0, 1), Polynomial.One);
        Assert.False(ZeroOrderHold.TryDiscretise(improper, 0.1, out _, out var error));
        Assert.Contains("improper", error, StringComparison.Ordinal);
        Assert.Throws<ArgumentException>(() => ZeroOrderHold.Discretise(Motor(), 0.0));
        Assert.Throws<ArgumentException>(() => ZeroOrderHold.Discretise(Motor(), double.PositiveInfinity));
    }

    private static RationalFunction Motor() => new(Polynomial.One, Polynomial.FromAscending(0, 1, 1));

    private static double LargestPoleModulus(RationalFunction gz, double gain) =>
        PolynomialRoots.Find(gz.Denominator + (gain * gz.Numerator)).Max(Complex.Abs);

    private static void AssertCoefficients(double[] expected, Polynomial actual)
    {
        Assert.Equal(expected.Length - 1, actual.Degree);
        for (int k = 0; k < expected.Length; k++)
        {
            Assert.Equal(expected[k], actual[k], Tight);
        }
    }
}
