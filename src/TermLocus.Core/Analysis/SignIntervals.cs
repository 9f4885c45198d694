namespace TermLocus.Core.Analysis;

/// <summary>
/// The sub-intervals of [from, to] where a function is &gt;= 0, with each interior end solved by bisection to a relative
/// tolerance of the end itself (so an end near 0 in a wide span is still solved to that share of its own value; the
/// floor for an end at 0 is <see cref="ZeroFloorShare"/> of the span's scale). Sign changes are bracketed on a uniform grid, so two crossings closer than one grid step may be missed;
/// callers pass extra candidate points (known boundaries) to be safe.
/// </summary>
public static class SignIntervals
{
    /// <summary>Default relative accuracy of a solved end: 1e-12 of max(|end|, <see cref="ZeroFloorShare"/> · scale).</summary>
    public const double DefaultRelTol = 1e-12;

    /// <summary>
    /// An end's accuracy refers to at least this share of the scale max(to − from, |from|, |to|), so an end at or near
    /// 0 is solved to relTol · 1e-3 · scale rather than to nothing.
    /// </summary>
    public const double ZeroFloorShare = 1e-3;

    /// <summary>
    /// Intervals of [<paramref name="from"/>, <paramref name="to"/>] where <paramref name="f"/> &gt;= 0, in order.
    /// <paramref name="gridPoints"/> (&gt;= 2) uniform samples plus <paramref name="extraPoints"/> inside the span bracket
    /// the sign changes. Throws <see cref="ArgumentException"/> when to &lt;= from or gridPoints &lt; 2.
    /// NaN from <paramref name="f"/> counts as negative (infeasible).
    /// </summary>
    public static IReadOnlyList<(double From, double To)> Find(
        Func<double, double> f, double from, double to, int gridPoints, IEnumerable<double>? extraPoints = null, double relTol = DefaultRelTol)
    {
        if (!(to > from) || gridPoints < 2)
        {
            throw new ArgumentException("Need from < to and at least two grid points.");
        }

        var xs = Enumerable.Range(0, gridPoints).Select(i => from + ((to - from) * i / (gridPoints - 1)))
            .Concat((extraPoints ?? []).Where(x => x > from && x < to))
            .Order().Distinct().ToArray();
        var ok = xs.Select(x => IsFeasible(f(x))).ToArray();
        double floor = ZeroFloorShare * Math.Max(to - from, Math.Max(Math.Abs(from), Math.Abs(to)));
        return FeasibleRuns.Collect(ok, from, to, i => Bisect(f, xs[i - 1], xs[i], ok[i - 1], relTol, floor));
    }

    private static bool IsFeasible(double v) => v >= 0.0;

    // Returns the feasible side's end of the bracket, so a reported interval never contains an infeasible point
    // by more than the tolerance.
    // The tolerance follows the shrinking bracket, so it ends up relative to the end itself.
    private static double Bisect(Func<double, double> f, double a, double b, bool okAtA, double relTol, double floor)
    {
        for (int i = 0; i < 200 && b - a > relTol * Math.Max(floor, Math.Max(Math.Abs(a), Math.Abs(b))); i++)
        {
            double m = a + ((b - a) / 2.0);
            if (IsFeasible(f(m)) == okAtA)
            {
                a = m;
            }
            else
            {
                b = m;
            }
        }

        return okAtA ? a : b;
    }
}
