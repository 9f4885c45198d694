namespace TermLocus.Core.Analysis;

/// <summary>Membership of a solved value in an analysed range, allowing for the last few bits of rounding.</summary>
internal static class LocusRange
{
    private const double Slack = 1e-12;

    internal static bool Contains(double from, double to, double value)
    {
        double slack = Slack * Math.Max(Math.Abs(from), Math.Abs(to));
        return value >= from - slack && value <= to + slack;
    }

    /// <summary>True when <paramref name="value"/> is one of the range's ends, to rounding.</summary>
    internal static bool AtEnd(double from, double to, double value)
    {
        double slack = Slack * Math.Max(Math.Abs(from), Math.Abs(to));
        return Math.Abs(value - from) <= slack || Math.Abs(value - to) <= slack;
    }
}
