using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.OdeSolvers;
using TermLocus.Core.Algebra;
using TermLocus.Core.Time;

namespace TermLocus.Core.Tests.Time;

public class HeldLoopResponseTests
{
    private static readonly RationalFunction Unity = RationalFunction.One;

    [Fact]
    public void First_order_plant_under_proportional_control_follows_the_closed_form_between_samples()
    {
        // Plant a/(s + a), controller K sampled every T, unity feedback. On [kT, (k+1)T) the held input is
        // u_k = K(1 − y_k) and y' = −a·y + a·u_k, so y(kT + σ) = e^{−aσ}·y_k + (1 − e^{−aσ})·u_k (first-order ODE with a
        // constant input, common practice). At σ = T: y_{k+1} = λ·y_k + K(1 − q) with q = e^{−aT}, λ = q − K(1 − q),
        // whose solution from y_0 = 0 is y_k = y∞(1 − λ^k), y∞ = K(1 − q)/(1 − λ) = K/(1 + K) (linear recurrence,
        // worked by hand). a = 2, T = 0.5, K = 1.5: λ = −0.58, the samples alternate about 0.6.
        const double a = 2.0, t = 0.5, k = 1.5;
        double q = Math.Exp(-a * t), lambda = q - (k * (1 - q)), final = k / (1 + k);
        var trace = HeldLoopResponse.Simulate(
            RationalFunction.Constant(k), new RationalFunction(Polynomial.Constant(a), Polynomial.FromAscending(a, 1)), Unity, false, t, 0.0, 30, 10);
        var between = trace.BetweenSamples;
        Assert.Equal((29 * 10) + 1, between.Count);
        for (int i = 0; i < between.Count; i++)
        {
            int sample = i / 10;
            double sigma = between.Times[i] - (sample * t);
            double yk = final * (1 - Math.Pow(lambda, sample));
            double uk = k * (1 - yk);
            Assert.Equal(((i % 10) * t / 10) + (sample * t), between.Times[i], 1e-14);
            Assert.Equal((Math.Exp(-a * sigma) * yk) + ((1 - Math.Exp(-a * sigma)) * uk), between.Outputs[i], 1e-12);
        }

        // Each piece runs monotonically towards u_k, so the largest value is the first sample, y_1 = y∞(1 − λ), at
        // t = T itself: the figures must not put a parabola through that kink.
        var figures = StepFigures.FromBetweenSamples(between, final, 10)!;
        Assert.Equal(-lambda * 100.0, figures.OvershootPct!.Value, 1e-9);
        Assert.Equal(t, figures.PeakTimeSeconds!.Value, 1e-12);
        Assert.Equal(final * (1 - lambda), trace.AtSamples.Outputs[1], 1e-12);
    }

    [Fact]
    public void Motor_loop_peaks_between_its_samples_above_the_sampled_peak()
    {
        // K/(s(s + 1)), K = 1, T = 1 s: the samples reach 1.3996 at k = 3 and 4 (Ogata, Discrete-Time Control Systems,
        // 2nd ed., ch. 4, from memory). Between them the held input u_3 = 1 − y(3) acts on a plant still moving
        // up, so the output peaks inside the interval. Checked against a brute-force integration of
        // y'' = −y' + u_k with MathNet's fourth-order Runge–Kutta, 2,000 steps per sample.
        var plant = new RationalFunction(Polynomial.One, Polynomial.FromAscending(0, 1, 1));
        var trace = HeldLoopResponse.Simulate(Unity, plant, Unity, false, 1.0, 0.0, 12, 10);
        var brute = BruteForceMotor(samples: 12, stepsPerSample: 2000);
        for (int i = 0; i < trace.BetweenSamples.Count; i++)
        {
            Assert.Equal(brute[i * 200], trace.BetweenSamples.Outputs[i], 1e-9);
        }

        Assert.Equal(1.3996, trace.AtSamples.Outputs[3], 1e-4);
        Assert.Equal(1.3996, trace.AtSamples.Outputs[4], 1e-4);
        double brutePeak = brute.Max();
        Assert.True(brutePeak > 1.3996 + 0.03, $"peak {brutePeak}"); // a real gap, not rounding
        var figures = StepFigures.FromBetweenSamples(trace.BetweenSamples, 1.0, 10)!;
        var sampled = StepFigures.FromSamples(trace.AtSamples, 1.0)!;
        // The figures refine the peak by a parabola through grid points a tenth of a sample apart: a few thousandths of
        // a percentage point (third-order term of the Taylor series over h = 0.1 s, by hand).
        Assert.Equal((brutePeak - 1) * 100, figures.OvershootPct!.Value, 5e-3);
        Assert.Equal(Array.IndexOf(brute, brutePeak) / 2000.0, figures.PeakTimeSeconds!.Value, 1e-2);
        Assert.Equal(39.96, sampled.OvershootPct!.Value, 1e-2);
    }

    [Fact]
    public void A_deadbeat_controller_hides_a_ripple_from_the_samples()
    {
        // Motor 1/(s(s + 1)), T = 1: G(z) = e^{−1}(z + e − 2)/((z − 1)(z − e^{−1})) (Ogata, Discrete-Time Control
        // Systems, 2nd ed., ch. 3 table, from memory). C(z) = e(z − e^{−1})/(z + e − 2) makes C·G = 1/(z − 1) and the
        // closed loop 1/z: y(kT) = 1 from k = 1 on (deadbeat design, same book, ch. 6, from memory). C cancels the
        // plant's sampling zero at −0.718, so u_k alternates, decaying like 0.718^k, and the output ripples between
        // samples (ibid.). Between samples: y(kT + σ) = y_k + v_k(1 − e^{−σ}) + u_k(σ − 1 + e^{−σ}) with velocity
        // v_{k+1} = v_k e^{−T} + u_k(1 − e^{−T}) (the motor's ODE with a held input, by hand); u from
        // u_k = −(e − 2)u_{k−1} + e·e_k − e_{k−1}, e_k = 1 − y_k.
        var plant = new RationalFunction(Polynomial.One, Polynomial.FromAscending(0, 1, 1));
        var controller = new RationalFunction(Polynomial.FromAscending(-1.0, Math.E), Polynomial.FromAscending(Math.E - 2, 1));
        var trace = HeldLoopResponse.Simulate(controller, plant, Unity, false, 1.0, 0.0, 25, 10);
        double y = 0, v = 0, uPrev = 0, ePrev = 0;
        for (int k = 0; k < 24; k++)
        {
            double e = 1 - y;
            double u = (-(Math.E - 2) * uPrev) + (Math.E * e) - ePrev;
            for (int j = 0; j < 10; j++)
            {
                double s = j / 10.0;
                double expected = y + (v * (1 - Math.Exp(-s))) + (u * (s - 1 + Math.Exp(-s)));
                Assert.Equal(expected, trace.BetweenSamples.Outputs[(k * 10) + j], 1e-9);
            }

            (y, v) = (y + (v * (1 - Math.Exp(-1))) + (u * Math.Exp(-1)), (v * Math.Exp(-1)) + (u * (1 - Math.Exp(-1))));
            (uPrev, ePrev) = (u, e);
        }

        var atSamples = StepFigures.FromSamples(trace.AtSamples, 1.0)!;
        var between = StepFigures.FromBetweenSamples(trace.BetweenSamples, 1.0, 10)!;
        Assert.All(trace.AtSamples.Outputs.Skip(1), o => Assert.Equal(1.0, o, 1e-9));
        Assert.Equal(0.0, atSamples.OvershootPct!.Value, 1e-7);
        Assert.True(between.OvershootPct > 5.0, $"ripple overshoot {between.OvershootPct}");
        Assert.True(between.SettlingTime2PctSeconds > 5.0, $"ripple settles at {between.SettlingTime2PctSeconds}");
    }

    [Fact]
    public void Points_per_sample_follow_the_fastest_plant_mode_and_the_budget()
    {
        // 30 points per cycle 2π/|p| (as the continuous grid): |p|·T = 10 gives ⌈300/2π⌉ = 48; a slow plant takes
        // the floor of 10; a very fast one the ceiling of 200; 20,001 samples leave room for 5 points each.
        var fast = new RationalFunction(Polynomial.One, Polynomial.FromAscending(100, 1));
        Assert.Equal(48, HeldLoopResponse.PointsPerSample(fast, 0.1, 100));
        Assert.Equal(HeldLoopResponse.MinimumPointsPerSample, HeldLoopResponse.PointsPerSample(fast, 0.001, 100));
        Assert.Equal(HeldLoopResponse.MaximumPointsPerSample, HeldLoopResponse.PointsPerSample(fast, 100.0, 100));
        Assert.Equal(5, HeldLoopResponse.PointsPerSample(fast, 0.1, 20001));
    }

    [Fact]
    public void Bad_arguments_and_non_causal_controllers_are_refused()
    {
        var plant = new RationalFunction(Polynomial.One, Polynomial.FromAscending(1, 1));
        var improper = new RationalFunction(Polynomial.FromAscending(0, 1), Polynomial.One);
        Assert.False(HeldLoopResponse.TrySimulate(improper, plant, Unity, false, 1.0, 0.0, 10, 10, out _, out string? why));
        Assert.Contains("not causal", why, StringComparison.Ordinal);
        Assert.False(HeldLoopResponse.TrySimulate(Unity, improper, plant, false, 1.0, 0.0, 10, 10, out _, out why));
        Assert.Contains("plant", why, StringComparison.Ordinal);
        Assert.False(HeldLoopResponse.TrySimulate(Unity, plant, Unity, false, 0.0, 0.0, 10, 10, out _, out _));
        Assert.False(HeldLoopResponse.TrySimulate(Unity, plant, Unity, false, 1.0, 0.0, 10, 0, out _, out _));

        // C = 1 and G = 1 in positive feedback with no delay: the instant's equation u = 1 + u has no solution.
        Assert.False(HeldLoopResponse.TrySimulate(Unity, Unity, Unity, true, 1.0, 0.0, 10, 10, out _, out why));
        Assert.Contains("no solution", why, StringComparison.Ordinal);
        Assert.True(HeldLoopResponse.TrySimulate(Unity, Unity, Unity, true, 1.0, 0.5, 10, 10, out _, out _)); // a delay breaks it
    }

    // y'' = −y' + u_k on each interval, u_k = 1 − y(k), integrated with RK4; one value per step, the last instant included.
    private static double[] BruteForceMotor(int samples, int stepsPerSample)
    {
        var result = new List<double>();
        var state = Vector<double>.Build.Dense(2);
        for (int k = 0; k < samples - 1; k++)
        {
            double u = 1 - state[0];
            var path = RungeKutta.FourthOrder(state, k, k + 1, stepsPerSample + 1, (_, x) => Vector<double>.Build.Dense([x[1], -x[1] + u]));
            result.AddRange(path.Take(stepsPerSample).Select(x => x[0]));
            state = path[^1];
        }

        result.Add(state[0]);
        return [.. result];
    }
}
