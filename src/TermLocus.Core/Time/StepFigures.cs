using TermLocus.Core.Algebra;

namespace TermLocus.Core.Time;

/// <summary>
/// Figures of a simulated unit-step response, all relative to the steady-state value y∞ (the response is divided
/// by y∞, so a negative steady-state gain is handled like a positive one). Times are in seconds on the trace's time axis
/// (they include any delay in the trace). A figure is null when the trace does not reach it, and every figure
/// except <see cref="SteadyState"/> is null when y∞ = 0.
/// </summary>
/// <param name="SteadyState">y∞, the steady-state gain of the closed loop.</param>
/// <param name="RiseTimeSeconds">From the first crossing of 10 % of y∞ to the next crossing of 90 %, each linearly
/// interpolated between samples; null when 90 % is never reached.</param>
/// <param name="PeakTimeSeconds">Time of the largest value (refined by a parabola through the three samples about
/// it); null when there is no overshoot.</param>
/// <param name="OvershootPct">(peak − y∞)/y∞ in percent, 0 when the response never exceeds y∞.</param>
/// <param name="SettlingTime2PctSeconds">The last time the response is outside ±2 % of y∞, interpolated to the
/// band edge; the first sample time (0) when it never leaves the band; null when it is still outside at the last sample.</param>
/// <param name="SettlingTime5PctSeconds">As <paramref name="SettlingTime2PctSeconds"/> for the ±5 % band.</param>
public sealed record StepFigures(
    double SteadyState,
    double? RiseTimeSeconds,
    double? PeakTimeSeconds,
    double? OvershootPct,
    double? SettlingTime2PctSeconds,
    double? SettlingTime5PctSeconds)
{
    private const double RiseStart = 0.1;
    private const double RiseEnd = 0.9;
    private const double NarrowBand = 0.02;
    private const double WideBand = 0.05;

    /// <summary>
    /// The steady-state gain N(0)/D(0) of a closed loop in s: the value its step response settles to. Null when the loop is
    /// not strictly stable (a pole with Re ≥ 0, which includes D(0) = 0), so no finite steady state exists.
    /// </summary>
    public static double? SteadyStateOf(RationalFunction closedLoop)
    {
        ArgumentNullException.ThrowIfNull(closedLoop);
        return LoopStability.IsStableInS(closedLoop.Denominator)
            ? closedLoop.Numerator.Evaluate(0.0) / closedLoop.Denominator.Evaluate(0.0)
            : null;
    }

    /// <summary>
    /// The steady-state gain N(1)/D(1) of a sampled closed loop in z; null unless every pole lies strictly inside the unit
    /// circle.
    /// </summary>
    public static double? SteadyStateOfSampled(RationalFunction closedLoopInZ)
    {
        ArgumentNullException.ThrowIfNull(closedLoopInZ);
        return LoopStability.IsStableInZ(closedLoopInZ.Denominator)
            ? closedLoopInZ.Numerator.Evaluate(1.0) / closedLoopInZ.Denominator.Evaluate(1.0)
            : null;
    }

    /// <summary>The figures of <paramref name="trace"/> about <paramref name="steadyState"/>; see the other overload.</summary>
    public static StepFigures? From(ResponseTrace trace, double? steadyState)
    {
        ArgumentNullException.ThrowIfNull(trace);
        return From(trace.Times, trace.Outputs, steadyState);
    }

    /// <summary>
    /// The figures of the step response sampled at <paramref name="times"/> (seconds, strictly increasing)
    /// with values <paramref name="outputs"/> (same length, at least 2), about <paramref name="steadyState"/>.
    /// Returns null when <paramref name="steadyState"/> is null (unstable loop or no finite steady state).
    /// Throws <see cref="ArgumentException"/> when the lengths differ, fewer than 2 samples are given, the times
    /// are not strictly increasing or a value is not finite.
    /// </summary>
    public static StepFigures? From(IReadOnlyList<double> times, IReadOnlyList<double> outputs, double? steadyState) =>
        From(times, outputs, steadyState, static _ => true);

    /// <summary>
    /// The figures of a sampled loop's output sequence (<see cref="StepResponse.SimulateSampled"/>): as
    /// <see cref="From(ResponseTrace, double?)"/>, except that the peak is the largest sample itself, not a parabola
    /// through three samples, since only the instants are given (the output between them is
    /// <see cref="HeldLoopResponse"/>'s, measured by <see cref="FromBetweenSamples"/>). Rise and settling times are still
    /// interpolated linearly between samples.
    /// </summary>
    public static StepFigures? FromSamples(ResponseTrace trace, double? steadyState)
    {
        ArgumentNullException.ThrowIfNull(trace);
        return From(trace.Times, trace.Outputs, steadyState, static _ => false);
    }

    /// <summary>
    /// The figures of a sampled loop's plant output between samples (<see cref="SampledLoopTrace.BetweenSamples"/>,
    /// <paramref name="pointsPerSample"/> points per interval, &gt;= 1): as <see cref="From(ResponseTrace, double?)"/>,
    /// except that the peak is refined by a parabola only when its point and both neighbours lie inside one sample
    /// interval. At a sample instant the held input switches and the output's slope (or, with feed-through, the output
    /// itself) jumps, so a parabola through a kink would overstate the peak; there the largest point is taken.
    /// Throws <see cref="ArgumentOutOfRangeException"/> for <paramref name="pointsPerSample"/> below 1, else as the other
    /// overloads.
    /// </summary>
    public static StepFigures? FromBetweenSamples(ResponseTrace trace, double? steadyState, int pointsPerSample)
    {
        ArgumentNullException.ThrowIfNull(trace);
        ArgumentOutOfRangeException.ThrowIfLessThan(pointsPerSample, 1);
        return From(trace.Times, trace.Outputs, steadyState, i => i % pointsPerSample != 0 && i % pointsPerSample != pointsPerSample - 1);
    }

    // canRefine(i): whether the peak at point i may be refined by a parabola through points i − 1, i, i + 1.
    private static StepFigures? From(IReadOnlyList<double> times, IReadOnlyList<double> outputs, double? steadyState, Func<int, bool> canRefine)
    {
        ArgumentNullException.ThrowIfNull(times);
        ArgumentNullException.ThrowIfNull(outputs);
        Validate(times, outputs);
        if (steadyState is not double final)
        {
            return null;
        }

        if (!double.IsFinite(final))
        {
            throw new ArgumentException("Steady state must be finite.", nameof(steadyState));
        }

        if (final == 0.0)
        {
            return new StepFigures(final, null, null, null, null, null);
        }

        var r = outputs.Select(y => y / final).ToArray();
        var (peakTime, peak) = Peak(times, r, canRefine);
        bool overshoots = peak > 1.0;
        return new StepFigures(
            final,
            RiseTime(times, r),
            overshoots ? peakTime : null,
            overshoots ? (peak - 1.0) * 100.0 : 0.0,
            SettlingTime(times, r, NarrowBand),
            SettlingTime(times, r, WideBand));
    }

    private static void Validate(IReadOnlyList<double> times, IReadOnlyList<double> outputs)
    {
        if (times.Count != outputs.Count || times.Count < 2)
        {
            throw new ArgumentException(
                $"Need equally many times and outputs, at least 2; got {times.Count} and {outputs.Count}.");
        }

        for (int k = 0; k < times.Count; k++)
        {
            if (!double.IsFinite(times[k]) || !double.IsFinite(outputs[k]) || (k > 0 && times[k] <= times[k - 1]))
            {
                throw new ArgumentException($"Sample {k} is not finite or its time does not increase.");
            }
        }
    }

    private static double? RiseTime(IReadOnlyList<double> t, double[] r)
    {
        int start = FirstAtOrAbove(r, RiseStart, 0);
        if (start < 0)
        {
            return null;
        }

        int end = FirstAtOrAbove(r, RiseEnd, start);
        return end < 0 ? null : Crossing(t, r, end, RiseEnd) - Crossing(t, r, start, RiseStart);
    }

    private static int FirstAtOrAbove(double[] r, double level, int from)
    {
        for (int k = from; k < r.Length; k++)
        {
            if (r[k] >= level)
            {
                return k;
            }
        }

        return -1;
    }

    // The time where the line through samples k-1 and k meets `level` (sample k's time when k is the first).
    private static double Crossing(IReadOnlyList<double> t, double[] r, int k, double level)
    {
        if (k == 0 || r[k] == r[k - 1])
        {
            return t[k];
        }

        double fraction = (level - r[k - 1]) / (r[k] - r[k - 1]);
        return t[k - 1] + (Math.Clamp(fraction, 0.0, 1.0) * (t[k] - t[k - 1]));
    }

    private static (double Time, double Value) Peak(IReadOnlyList<double> t, double[] r, Func<int, bool> canRefine)
    {
        int best = 0;
        for (int k = 1; k < r.Length; k++)
        {
            if (r[k] > r[best])
            {
                best = k;
            }
        }

        if (best == 0 || best == r.Length - 1 || !canRefine(best))
        {
            return (t[best], r[best]);
        }

        // y = r1 + b·u + a·u² through the three samples, u = time − t1.
        double u0 = t[best - 1] - t[best], u2 = t[best + 1] - t[best];
        double d0 = (r[best - 1] - r[best]) / u0, d2 = (r[best + 1] - r[best]) / u2;
        double a = (d0 - d2) / (u0 - u2);
        if (!(a < 0.0))
        {
            return (t[best], r[best]);
        }

        double b = d0 - (a * u0);
        double u = Math.Clamp(-b / (2.0 * a), u0, u2);
        return (t[best] + u, Math.Max(r[best], r[best] + (b * u) + (a * u * u)));
    }

    private static double? SettlingTime(IReadOnlyList<double> t, double[] r, double band)
    {
        int last = -1;
        for (int k = r.Length - 1; k >= 0; k--)
        {
            if (Math.Abs(r[k] - 1.0) > band)
            {
                last = k;
                break;
            }
        }

        if (last < 0)
        {
            return t[0];
        }

        if (last == r.Length - 1)
        {
            return null;
        }

        double edge = r[last] > 1.0 ? 1.0 + band : 1.0 - band;
        double fraction = (r[last] - edge) / (r[last] - r[last + 1]);
        return t[last] + (Math.Clamp(fraction, 0.0, 1.0) * (t[last + 1] - t[last]));
    }
}
