using TermLocus.Core.Algebra;
using TermLocus.Core.Time;

namespace TermLocus.Core.Tests.Time;

public class StepResponseTests
{
    private const double Exact = 1e-9;

    [Fact]
    public void First_order_lag_follows_one_minus_exponential()
    {
        // 1/(τs + 1): y = 1 − e^{−t/τ} (K. Ogata, Modern Control Engineering, 5th ed., §5-2, from memory).
        const double tau = 0.5;
        var trace = StepResponse.Simulate(Lag(tau), 4.0, 401);
        Assert.Equal(401, trace.Count);
        Assert.Equal(4.0, trace.Times[^1], 1e-15);
        for (int k = 0; k < trace.Count; k++)
        {
            Assert.Equal(1.0 - Math.Exp(-trace.Times[k] / tau), trace.Outputs[k], Exact);
        }
    }

    [Theory]
    [InlineData(0.5, 2.0)]
    [InlineData(0.1, 10.0)]
    [InlineData(0.9, 0.3)]
    public void Underdamped_second_order_loop_matches_the_closed_form(double zeta, double wn)
    {
        // ωn²/(s² + 2ζωn s + ωn²): y = 1 − e^{−ζωn t}/√(1−ζ²) · sin(ωd t + acos ζ)
        // (K. Ogata, Modern Control Engineering, 5th ed., §5-3, from memory).
        var trace = StepResponse.Simulate(SecondOrder(zeta, wn), 12.0 / (zeta * wn), 2000);
        double wd = wn * Math.Sqrt(1 - (zeta * zeta));
        for (int k = 0; k < trace.Count; k++)
        {
            double t = trace.Times[k];
            double y = 1 - (Math.Exp(-zeta * wn * t) / Math.Sqrt(1 - (zeta * zeta)) * Math.Sin((wd * t) + Math.Acos(zeta)));
            Assert.Equal(y, trace.Outputs[k], Exact);
        }
    }

    [Fact]
    public void Direct_feed_through_appears_at_time_zero()
    {
        // (2s + 1)/(s + 1) = 2 − 1/(s + 1), so the step response is 1 + e^{−t} (partial fractions, common practice).
        var h = new RationalFunction(Polynomial.FromAscending(1, 2), Polynomial.FromAscending(1, 1));
        var trace = StepResponse.Simulate(h, 5.0, 101);
        Assert.Equal(2.0, trace.Outputs[0], Exact);
        for (int k = 0; k < trace.Count; k++)
        {
            Assert.Equal(1.0 + Math.Exp(-trace.Times[k]), trace.Outputs[k], Exact);
        }
    }

    [Fact]
    public void Stiff_rig_with_coefficients_from_1e_minus_6_to_1e6_is_exact()
    {
        // 1/((s+a)(s+b)) with a = 1e-3, b = 1e3, written with leading coefficient 1e-6:
        // y = (1/(ab)) [1 − (b e^{−at} − a e^{−bt})/(b − a)] (partial fractions, common practice).
        const double a = 1e-3, b = 1e3;
        var h = new RationalFunction(Polynomial.Constant(1e-6), Polynomial.FromDescending(1e-6, 1e-6 * (a + b), 1e-6 * a * b));
        var trace = StepResponse.Simulate(h, 5000.0, 2001);
        for (int k = 0; k < trace.Count; k++)
        {
            double t = trace.Times[k];
            double y = (1 - (((b * Math.Exp(-a * t)) - (a * Math.Exp(-b * t))) / (b - a))) / (a * b);
            Assert.Equal(y, trace.Outputs[k], Exact * Math.Max(1.0, Math.Abs(y)));
        }
    }

    [Fact]
    public void Integrator_ramps_and_unstable_loop_grows_exactly()
    {
        // 1/s: y = t; 1/(s − 1): y = e^t − 1 (inverse Laplace transforms, common practice).
        var ramp = StepResponse.Simulate(new RationalFunction(Polynomial.One, Polynomial.X), 3.0, 31);
        var growth = StepResponse.Simulate(new RationalFunction(Polynomial.One, Polynomial.FromAscending(-1, 1)), 3.0, 31);
        for (int k = 0; k < ramp.Count; k++)
        {
            Assert.Equal(ramp.Times[k], ramp.Outputs[k], Exact);
            Assert.Equal(Math.Exp(growth.Times[k]) - 1, growth.Outputs[k], Exact * Math.Exp(growth.Times[k]));
        }
    }

    [Theory]
    [InlineData(0.37)] // between grid points
    [InlineData(0.4)] // on a grid point
    public void Delay_shifts_the_response_exactly(double delay)
    {
        // y(t) = y0(t − T) for t ≥ T, 0 before (definition of a transport delay; e^{−sT} shift theorem).
        const double tau = 0.25;
        var trace = StepResponse.Simulate(Lag(tau), 2.0, 201, delay);
        for (int k = 0; k < trace.Count; k++)
        {
            double t = trace.Times[k];
            double y = t >= delay - 1e-12 ? 1.0 - Math.Exp(-(t - delay) / tau) : 0.0;
            Assert.Equal(y, trace.Outputs[k], Exact);
        }
    }

    [Fact]
    public void Delay_longer_than_the_duration_leaves_the_output_at_rest()
    {
        var trace = StepResponse.Simulate(Lag(1.0), 1.0, 11, delaySeconds: 5.0);
        Assert.All(trace.Outputs, y => Assert.Equal(0.0, y, 0.0));
    }

    [Fact]
    public void Sampled_first_order_loop_follows_its_difference_equation()
    {
        // (1 − a)/(z − a): y[0] = 0, y[k] = 1 − a^k (geometric series, common practice).
        const double a = 0.8;
        var h = new RationalFunction(Polynomial.Constant(1 - a), Polynomial.FromAscending(-a, 1));
        var trace = StepResponse.SimulateSampled(h, 0.01, 50);
        for (int k = 0; k < trace.Count; k++)
        {
            Assert.Equal(0.01 * k, trace.Times[k], 1e-15);
            Assert.Equal(1 - Math.Pow(a, k), trace.Outputs[k], 1e-13);
        }
    }

    [Fact]
    public void Bad_arguments_are_refused_with_reasons()
    {
        var improper = new RationalFunction(Polynomial.FromAscending(0, 0, 1), Polynomial.FromAscending(1, 1));
        Assert.False(StepResponse.TrySimulate(improper, 1.0, 10, 0.0, out _, out var error));
        Assert.Contains("improper", error, StringComparison.Ordinal);
        Assert.Throws<ArgumentException>(() => StepResponse.Simulate(Lag(1), 0.0, 10));
        Assert.Throws<ArgumentException>(() => StepResponse.Simulate(Lag(1), 1.0, 1));
        Assert.Throws<ArgumentException>(() => StepResponse.Simulate(Lag(1), 1.0, 10, -0.1));
        Assert.Throws<ArgumentException>(() => StepResponse.Simulate(Lag(1), double.NaN, 10));
    }

    internal static RationalFunction Lag(double tau) =>
        new(Polynomial.One, Polynomial.FromAscending(1.0, tau));

    internal static RationalFunction SecondOrder(double zeta, double wn) =>
        new(Polynomial.Constant(wn * wn), Polynomial.FromAscending(wn * wn, 2 * zeta * wn, 1));
}
