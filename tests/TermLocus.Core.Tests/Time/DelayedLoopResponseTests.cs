using TermLocus.Core.Algebra;
using TermLocus.Core.Time;

namespace TermLocus.Core.Tests.Time;

public class DelayedLoopResponseTests
{
    private const double Exact = 1e-11;

    [Theory]
    [InlineData(0.5, 1.0, 1)]
    [InlineData(0.5, 1.0, 7)]
    [InlineData(1.2, 0.3, 25)]
    public void Integrator_loop_with_delay_follows_the_method_of_steps(double gain, double delay, int stepsPerDelay)
    {
        // y' = K(1 − y(t − T)), y = 0 for t <= T. The method of steps, done by hand interval after interval, gives
        // y(t) = Σ_{m>=1} (−1)^{m+1} K^m (t − mT)^m / m! over the m with t >= mT (R. Bellman, K. L. Cooke,
        // Differential-Difference Equations, 1963, ch. 3, the method of steps, from memory; the sum is worked here).
        var trace = DelayedLoopResponse.Simulate(Integrator(gain), RationalFunction.One, false, delay, 12 * delay, stepsPerDelay);
        Assert.Equal(12 * stepsPerDelay + 1, trace.Count);
        for (int j = 0; j < trace.Count; j++)
        {
            double t = trace.Times[j];
            Assert.Equal(IntegratorLoop(gain, delay, t), trace.Outputs[j], Exact);
        }
    }

    [Fact]
    public void First_order_lag_with_delay_matches_the_method_of_steps_over_three_delays()
    {
        // F = K/(τs + 1), H = 1, delay T: x solves τx' + x = K(1 − x(t − T)), y(t) = x(t − T). Worked by hand:
        // on [0, T]: x = K(1 − e^{−t/τ}); on [T, 2T] with u = t − T: x = K(1 − K) + K²(u/τ)e^{−u/τ} + (K² − K e^{−T/τ})e^{−u/τ}
        // (substitution checks it; the method of steps, Bellman & Cooke 1963, from memory).
        const double k = 0.8, tau = 0.7, delay = 0.4;
        var lag = new RationalFunction(Polynomial.Constant(k), Polynomial.FromAscending(1, tau));
        var trace = DelayedLoopResponse.Simulate(lag, RationalFunction.One, false, delay, 3 * delay, 40);
        for (int j = 0; j < trace.Count; j++)
        {
            double t = trace.Times[j];
            double expected = t <= delay ? 0.0 : X(t - delay);
            Assert.Equal(expected, trace.Outputs[j], Exact);
        }

        double X(double t)
        {
            if (t <= delay)
            {
                return k * (1 - Math.Exp(-t / tau));
            }

            double u = t - delay;
            return (k * (1 - k)) + (k * k * u / tau * Math.Exp(-u / tau)) + (((k * k) - (k * Math.Exp(-delay / tau))) * Math.Exp(-u / tau));
        }
    }

    [Fact]
    public void The_grid_density_does_not_change_the_values_it_shares()
    {
        // Exactness at the grid instants means a coarse and a fine grid agree where they meet; a delay line that
        // held the delayed signal over each step would differ by O(h) (common practice for one-step methods).
        var plant = new RationalFunction(Polynomial.FromAscending(2, 1), Polynomial.FromAscending(0, 3, 4, 1));
        var sensor = new RationalFunction(Polynomial.Constant(5), Polynomial.FromAscending(5, 1));
        var coarse = DelayedLoopResponse.Simulate(plant, sensor, false, 0.3, 15.0, 1);
        var fine = DelayedLoopResponse.Simulate(plant, sensor, false, 0.3, 15.0, 64);
        Assert.True(coarse.Outputs.Max(Math.Abs) > 0.1);
        for (int j = 0; j < coarse.Count; j++)
        {
            Assert.Equal(coarse.Times[j], fine.Times[64 * j], 1e-12);
            Assert.Equal(coarse.Outputs[j], fine.Outputs[64 * j], 1e-10);
        }
    }

    [Fact]
    public void A_tiny_delay_agrees_with_a_high_order_pade_loop()
    {
        // For ωT small the [10/10] Padé approximant's phase error, (10!)²/(20!·21!)·(ωT)^21 rad, is far below
        // rounding (Baker & Graves-Morris, Padé Approximants, 2nd ed., ch. 1, from memory), so the Padé closed loop
        // simulated exactly by StepResponse is a reference for the delay loop. Measured gap: 2.8e-6 (the Padé loop
        // rings about the kink the delayed step makes at t = T; orders 3 and 5 give 4.4e-5 and 1.3e-5).
        const double delay = 0.05;
        var plant = new RationalFunction(Polynomial.Constant(4), Polynomial.FromAscending(0, 2, 1));
        var pade = PadeApproximant.Delay(delay, PadeApproximant.MaximumOrder);
        var open = plant * pade;
        var closed = new RationalFunction(open.Numerator, open.Denominator + open.Numerator);
        var reference = StepResponse.Simulate(closed, 8.0, 801);
        var exact = DelayedLoopResponse.Simulate(plant, RationalFunction.One, false, delay, 8.0, 5);
        for (int j = 0; j < reference.Count; j += 10)
        {
            Assert.Equal(reference.Times[j], exact.Times[j], 1e-12);
            Assert.Equal(reference.Outputs[j], exact.Outputs[j], 1e-5);
        }
    }

    [Fact]
    public void Positive_feedback_and_feedthrough_in_both_paths_are_handled()
    {
        // F = 0.5 (a pure gain), H = 1, positive feedback: y(t) = 0.5(1 + y(t − T)) delayed, a neutral loop; at
        // t in [mT, (m+1)T) the output is Σ_{i=1..m} 0.5^i = 1 − 0.5^m (the geometric series, by hand).
        var trace = DelayedLoopResponse.Simulate(RationalFunction.Constant(0.5), RationalFunction.One, true, 1.0, 10.0, 2);
        for (int j = 0; j < trace.Count; j++)
        {
            int m = j / 2;
            Assert.Equal(1 - Math.Pow(0.5, m), trace.Outputs[j], 1e-14);
        }
    }

    [Fact]
    public void Bad_arguments_are_refused()
    {
        var one = RationalFunction.One;
        Assert.Throws<ArgumentException>(() => DelayedLoopResponse.Simulate(one, one, false, 0.0, 1.0, 1));
        Assert.Throws<ArgumentException>(() => DelayedLoopResponse.Simulate(one, one, false, 1.0, double.NaN, 1));
        Assert.Throws<ArgumentException>(() => DelayedLoopResponse.Simulate(one, one, false, 1.0, 1.0, 0));
        Assert.Throws<ArgumentException>(() => DelayedLoopResponse.Simulate(one, one, false, 1e-6, 1.0, 1));
        var improper = new RationalFunction(Polynomial.X, Polynomial.One);
        Assert.False(DelayedLoopResponse.TrySimulate(improper, one, false, 1.0, 1.0, 1, out _, out var error));
        Assert.Contains("improper", error, StringComparison.Ordinal);
    }

    private static RationalFunction Integrator(double gain) => new(Polynomial.Constant(gain), Polynomial.X);

    private static double IntegratorLoop(double gain, double delay, double t)
    {
        double sum = 0.0, factorial = 1.0;
        for (int m = 1; t >= m * delay; m++)
        {
            factorial *= m;
            sum += (m % 2 == 1 ? 1 : -1) * Math.Pow(gain * (t - (m * delay)), m) / factorial;
        }

        return sum;
    }
}
