using System.Collections.Immutable;
using System.Diagnostics.CodeAnalysis;
using System.Globalization;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Time;

/// <summary>
/// The unit-step response of a closed loop, exact at the sample instants: the transfer function is realised in
/// state space, the input is constant between samples, so x[k+1] = Φ·x[k] + Γ with Φ, Γ from one augmented matrix
/// exponential (no integration error; only rounding, about 1e-12 relative over thousands of samples).
/// The loop starts at rest and the unit step is applied at t = 0, so y(0) equals the direct feed-through.
/// </summary>
public static class StepResponse
{
    // A delay within this fraction of a sample interval of a grid time is taken to fall on that grid time.
    private const double GridSnapTolerance = 1e-9;

    /// <summary>
    /// The step response of <paramref name="closedLoop"/> (a proper rational function of s) on the uniform grid
    /// t_k = duration·k/(samples − 1), k = 0..samples − 1, with an exact transport delay of
    /// <paramref name="delaySeconds"/> outside the loop: y(t) = y₀(t − T) for t &gt;= T and 0 before, where y₀ is
    /// the undelayed response. (A delay inside the loop must be put into the loop, e.g. as a Padé approximant,
    /// before the closed loop is formed.) Durations and the delay are in seconds: duration &gt; 0, samples &gt;= 2,
    /// delay &gt;= 0, all finite. Throws <see cref="ArgumentException"/> on a bad argument or an improper loop.
    /// </summary>
    public static ResponseTrace Simulate(
        RationalFunction closedLoop, double durationSeconds, int samples, double delaySeconds = 0.0) =>
        TrySimulate(closedLoop, durationSeconds, samples, delaySeconds, out var trace, out var error)
            ? trace
            : throw new ArgumentException(error);

    /// <summary>As <see cref="Simulate(RationalFunction, double, int, double)"/> on the grid given.</summary>
    public static ResponseTrace Simulate(RationalFunction closedLoop, ResponseGrid grid, double delaySeconds = 0.0)
    {
        ArgumentNullException.ThrowIfNull(grid);
        return Simulate(closedLoop, grid.DurationSeconds, grid.Samples, delaySeconds);
    }

    /// <summary>
    /// As <see cref="Simulate(RationalFunction, double, int, double)"/>, returning false with a one-line reason
    /// in <paramref name="error"/> instead of throwing.
    /// </summary>
    public static bool TrySimulate(
        RationalFunction closedLoop,
        double durationSeconds,
        int samples,
        double delaySeconds,
        [NotNullWhen(true)] out ResponseTrace? trace,
        [NotNullWhen(false)] out string? error)
    {
        ArgumentNullException.ThrowIfNull(closedLoop);
        trace = null;
        error = CheckGrid(durationSeconds, samples, delaySeconds);
        if (error is not null || !StateSpace.TryFromTransferFunction(closedLoop, out var system, out error))
        {
            return false;
        }

        var times = new double[samples];
        for (int k = 0; k < samples; k++)
        {
            times[k] = durationSeconds * k / (samples - 1);
        }

        double interval = durationSeconds / (samples - 1);
        var outputs = DelayedOutputs(system, times, interval, delaySeconds);
        trace = new ResponseTrace(ImmutableArray.Create(times), ImmutableArray.Create(outputs));
        return true;
    }

    /// <summary>
    /// The step response of a sampled closed loop given as a proper rational function of z, at the sampling
    /// instants t_k = k·T, k = 0..samples − 1 (T = <paramref name="sampleTimeSeconds"/> &gt; 0, samples &gt;= 2):
    /// the output sequence of the difference equation driven by u[k] = 1. Throws <see cref="ArgumentException"/>
    /// on a bad argument or an improper (non-causal) function.
    /// </summary>
    public static ResponseTrace SimulateSampled(RationalFunction closedLoopInZ, double sampleTimeSeconds, int samples)
    {
        ArgumentNullException.ThrowIfNull(closedLoopInZ);
        string? error = CheckGrid(sampleTimeSeconds, samples, 0.0);
        if (error is not null || !StateSpace.TryFromTransferFunction(closedLoopInZ, out var system, out error))
        {
            throw new ArgumentException(error);
        }

        var times = new double[samples];
        for (int k = 0; k < samples; k++)
        {
            times[k] = sampleTimeSeconds * k;
        }

        var outputs = new double[samples];
        Run(system, system.A.ToArray(), system.B.ToArray(), new double[system.Order], outputs, 0);
        return new ResponseTrace(ImmutableArray.Create(times), ImmutableArray.Create(outputs));
    }

    private static string? CheckGrid(double duration, int samples, double delay)
    {
        if (!double.IsFinite(duration) || duration <= 0.0)
        {
            return "Duration must be a finite number of seconds above 0, got " +
                   duration.ToString("R", CultureInfo.InvariantCulture) + ".";
        }

        if (samples < 2)
        {
            return "At least 2 samples are needed, got " + samples.ToString(CultureInfo.InvariantCulture) + ".";
        }

        if (!double.IsFinite(delay) || delay < 0.0)
        {
            return "Delay must be a finite number of seconds, 0 or above, got " +
                   delay.ToString("R", CultureInfo.InvariantCulture) + ".";
        }

        return null;
    }

    private static double[] DelayedOutputs(StateSpace system, double[] times, double interval, double delay)
    {
        var outputs = new double[times.Length];
        int first = FirstIndexAtOrAfter(delay, interval, out double offset);
        if (first >= times.Length)
        {
            return outputs;
        }

        int n = system.Order;
        var step = HoldDiscretisation.Of(system, interval);

        // Between the delayed step and the first grid time the state has followed the step for `offset` seconds.
        var x = offset > 0.0 ? HoldDiscretisation.Of(system, offset).Gamma.ToArray() : new double[n];
        Run(system, step.Phi.ToArray(), step.Gamma.ToArray(), x, outputs, first);
        return outputs;
    }

    private static int FirstIndexAtOrAfter(double delay, double interval, out double offset)
    {
        double ratio = delay / interval;
        double nearest = Math.Round(ratio);
        if (Math.Abs(ratio - nearest) <= GridSnapTolerance * Math.Max(1.0, ratio))
        {
            offset = 0.0;
            return nearest >= int.MaxValue ? int.MaxValue : (int)nearest;
        }

        double first = Math.Ceiling(ratio);
        offset = Math.Max(0.0, (first * interval) - delay);
        return first >= int.MaxValue ? int.MaxValue : (int)first;
    }

    // Steps x[k+1] = Φ·x[k] + Γ from index `first` on, writing y[k] = C·x[k] + D. Plain arrays keep the inner
    // loop free of allocations.
    private static void Run(StateSpace system, double[,] phi, double[] gamma, double[] x, double[] y, int first)
    {
        int n = system.Order;
        var c = system.C.ToArray();
        var next = new double[n];
        for (int k = first; k < y.Length; k++)
        {
            double output = system.D;
            for (int i = 0; i < n; i++)
            {
                output += c[i] * x[i];
            }

            y[k] = output;
            for (int i = 0; i < n; i++)
            {
                double acc = gamma[i];
                for (int j = 0; j < n; j++)
                {
                    acc += phi[i, j] * x[j];
                }

                next[i] = acc;
            }

            (x, next) = (next, x);
        }
    }
}
