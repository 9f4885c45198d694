using System.Collections.Immutable;
using System.Diagnostics.CodeAnalysis;
using System.Globalization;
using MathNet.Numerics.LinearAlgebra;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Time;

/// <summary>
/// The unit-step response of a feedback loop with a transport delay T INSIDE the loop: e = r ∓ H·y,
/// y(t) = (F·e)(t − T), the loop at rest before t = 0 and r = 1 from t = 0 on. Its closed loop is
/// e^{−sT}·F / (1 ± F·H·e^{−sT}), a delay-differential system, which no rational function represents exactly.
/// <para>Method (exact, not an approximation of the delay): the time step is h = T/k, so every instant where the
/// delayed step and its echoes arrive (multiples of T) falls on the grid. The method of steps in closed form: the
/// state one step ahead is η(t + h) = Σᵢ Eᵢ·η(t − iT), where Eᵢ are the blocks of the exponential of the stacked
/// past segments (see <see cref="DelayChainExponential"/>). This is the exact solution of the delay equation at the
/// grid instants, for any k, with no holding or interpolation of the delayed signal; k only sets how densely the
/// output is sampled. Error: rounding (in the tests the values match method-of-steps closed forms to 1e-11 over
/// twelve delays, and a grid of 1 and of 64 steps per delay agree to 1e-14 where they meet), plus the
/// neglected tail of the sum: past segments are kept until their block falls below 1e-17 of the largest, or up to
/// <see cref="MaximumSegments"/> of them. The blocks shrink like (h·‖N‖)ⁱ/i! when F and H do not both feed through
/// directly, so the tail is nil in practice; when both do (a neutral loop, |d| = |d_F·d_H|) they shrink like |d|ⁱ,
/// and for |d| close to or above 1 the tail after <see cref="MaximumSegments"/> segments is dropped.</para>
/// <para>Values at an instant where the output jumps (a loop with direct feed-through) are the values just after.</para>
/// </summary>
public static class DelayedLoopResponse
{
    /// <summary>The most grid steps one simulation takes.</summary>
    public const int MaximumSteps = 200_000;

    /// <summary>The most past delay segments the propagator keeps.</summary>
    public const int MaximumSegments = 128;

    private const int FirstSegments = 16;
    private const double NegligibleBlock = 1e-17;

    /// <summary>
    /// The step response of the loop with forward path <paramref name="forward"/> (F, proper, rational in s),
    /// feedback path <paramref name="feedback"/> (H, proper) and sign (<paramref name="positiveFeedback"/>: e = r + H·y),
    /// delay <paramref name="delaySeconds"/> (T, finite, &gt; 0) in the forward path, on the grid t_j = j·T/k,
    /// k = <paramref name="stepsPerDelay"/> (&gt;= 1), from 0 to the first grid time at or after
    /// <paramref name="durationSeconds"/> (finite, &gt; 0). Throws <see cref="ArgumentException"/> for a bad
    /// argument, an improper F or H, or more than <see cref="MaximumSteps"/> steps.
    /// </summary>
    public static ResponseTrace Simulate(
        RationalFunction forward,
        RationalFunction feedback,
        bool positiveFeedback,
        double delaySeconds,
        double durationSeconds,
        int stepsPerDelay) =>
        TrySimulate(forward, feedback, positiveFeedback, delaySeconds, durationSeconds, stepsPerDelay, out var trace, out var error)
            ? trace
            : throw new ArgumentException(error);

    /// <summary>As <see cref="Simulate"/>, returning false with a one-line reason instead of throwing.</summary>
    public static bool TrySimulate(
        RationalFunction forward,
        RationalFunction feedback,
        bool positiveFeedback,
        double delaySeconds,
        double durationSeconds,
        int stepsPerDelay,
        [NotNullWhen(true)] out ResponseTrace? trace,
        [NotNullWhen(false)] out string? error)
    {
        ArgumentNullException.ThrowIfNull(forward);
        ArgumentNullException.ThrowIfNull(feedback);
        trace = null;
        error = CheckGrid(delaySeconds, durationSeconds, stepsPerDelay, out int steps);
        if (error is not null
            || !StateSpace.TryFromTransferFunction(forward, out var f, out error)
            || !StateSpace.TryFromTransferFunction(feedback, out var h, out error))
        {
            return false;
        }

        var system = DelayedLoopSystem.Of(f, h, positiveFeedback ? 1.0 : -1.0);
        double step = delaySeconds / stepsPerDelay;
        int segments = (steps / stepsPerDelay) + 1;
        var blocks = Propagator(system, step, segments);
        var outputs = Run(system, blocks, stepsPerDelay, steps);
        var times = Enumerable.Range(0, steps + 1).Select(j => j * step).ToImmutableArray();
        trace = new ResponseTrace(times, ImmutableArray.Create(outputs));
        return true;
    }

    private static string? CheckGrid(double delay, double duration, int stepsPerDelay, out int steps)
    {
        steps = 0;
        if (!double.IsFinite(delay) || delay <= 0.0)
        {
            return "Delay must be a finite number of seconds above 0, got " + delay.ToString("R", CultureInfo.InvariantCulture) + ".";
        }

        if (!double.IsFinite(duration) || duration <= 0.0)
        {
            return "Duration must be a finite number of seconds above 0, got " + duration.ToString("R", CultureInfo.InvariantCulture) + ".";
        }

        if (stepsPerDelay < 1)
        {
            return "At least 1 step per delay is needed, got " + stepsPerDelay.ToString(CultureInfo.InvariantCulture) + ".";
        }

        double wanted = Math.Ceiling((duration / delay * stepsPerDelay) - 1e-9);
        if (!(wanted <= MaximumSteps))
        {
            return $"The grid would need more than {MaximumSteps} steps; use fewer steps per delay or a shorter duration.";
        }

        steps = Math.Max(1, (int)wanted);
        return null;
    }

    // E₀..E_I with the tail dropped once a block is negligible; the stack grows (doubling) until it is, or until it
    // holds every segment the grid reaches, which makes the sum complete.
    private static Matrix<double>[] Propagator(DelayedLoopSystem system, double step, int segments)
    {
        int blocks = Math.Min(segments, FirstSegments);
        while (true)
        {
            var e = DelayChainExponential.Compute(system.A, system.DelayedCoupling, system.Feedthrough, step, blocks);
            double largest = e.Max(m => m.L1Norm());
            int last = e.Length - 1;
            while (last > 0 && e[last].L1Norm() <= NegligibleBlock * largest)
            {
                last--;
            }

            bool complete = blocks >= segments || last < blocks - 1 || blocks >= MaximumSegments;
            if (complete)
            {
                return e[..(last + 1)];
            }

            blocks = Math.Min(Math.Min(segments, MaximumSegments), 2 * blocks);
        }
    }

    // η_{j+1} = Σᵢ Eᵢ·η_{j−ik} (η before 0 is zero, η₀ = (0, ..., 0, 1)); x_j = c·η_j + d·x_{j−k}; y_j = x_{j−k}.
    private static double[] Run(DelayedLoopSystem system, Matrix<double>[] blocks, int k, int steps)
    {
        int n = system.Order;
        var e = blocks.Select(m => m.ToArray()).ToArray();
        var c = system.Output.ToArray();
        var eta = new double[steps + 1][];
        var x = new double[steps + 1];
        var y = new double[steps + 1];
        eta[0] = new double[n];
        eta[0][n - 1] = 1.0;
        for (int j = 0; j <= steps; j++)
        {
            if (j > 0)
            {
                eta[j] = Advance(e, eta, j - 1, k, n);
            }

            double xj = system.Feedthrough * (j >= k ? x[j - k] : 0.0);
            for (int i = 0; i < n; i++)
            {
                xj += c[i] * eta[j][i];
            }

            x[j] = xj;
            y[j] = j >= k ? x[j - k] : 0.0;
        }

        return y;
    }

    private static double[] Advance(double[][,] e, double[][] eta, int j, int k, int n)
    {
        var next = new double[n];
        for (int i = 0; i < e.Length && j - (i * k) >= 0; i++)
        {
            var block = e[i];
            var past = eta[j - (i * k)];
            for (int r = 0; r < n; r++)
            {
                double acc = 0.0;
                for (int col = 0; col < n; col++)
                {
                    acc += block[r, col] * past[col];
                }

                next[r] += acc;
            }
        }

        return next;
    }
}
