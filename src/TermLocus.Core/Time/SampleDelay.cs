namespace TermLocus.Core.Time;

/// <summary>
/// A transport delay measured in sample intervals: <see cref="WholeSamples"/> whole intervals plus a remainder
/// <see cref="RemainderSeconds"/> in [0, T). A delay within 1e-9 (relative) of a whole number of intervals counts
/// as whole, so that a delay written as 3 × 0.001 s is not split into 2 intervals and 0.000999999... s.
/// </summary>
/// <param name="WholeSamples">The number of whole sample intervals, &gt;= 0.</param>
/// <param name="RemainderSeconds">The rest of the delay in seconds, 0 or in (0, T).</param>
internal readonly record struct SampleDelay(int WholeSamples, double RemainderSeconds)
{
    private const double SnapTolerance = 1e-9;

    /// <summary>The largest number of whole samples accepted; a longer delay is refused by the caller.</summary>
    public const int MaximumWholeSamples = 1000;

    /// <summary>
    /// Splits <paramref name="delaySeconds"/> (finite, &gt;= 0) by <paramref name="sampleTimeSeconds"/> (finite,
    /// &gt; 0). Returns false when the delay spans more than <see cref="MaximumWholeSamples"/> intervals.
    /// </summary>
    public static bool TrySplit(double delaySeconds, double sampleTimeSeconds, out SampleDelay split)
    {
        double ratio = delaySeconds / sampleTimeSeconds;
        split = default;
        if (!(ratio <= MaximumWholeSamples))
        {
            return false;
        }

        double nearest = Math.Round(ratio);
        if (Math.Abs(ratio - nearest) <= SnapTolerance * Math.Max(1.0, ratio))
        {
            split = new SampleDelay((int)nearest, 0.0);
            return true;
        }

        double whole = Math.Floor(ratio);
        split = new SampleDelay((int)whole, delaySeconds - (whole * sampleTimeSeconds));
        return true;
    }
}
