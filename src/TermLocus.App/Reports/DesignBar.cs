using System.Text;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.App.Reports;

/// <summary>
/// The feasible intervals of a design as a one-line bar over the swept span, e.g. <c>[----====|===----]</c>:
/// one cell per equal slice of the span, <c>=</c> where the slice is mostly feasible, <c>-</c> where it is not,
/// <c>|</c> at the recommended value. Plain ASCII, so it reads the same in every terminal and in logs.
/// </summary>
public static class DesignBar
{
    /// <summary>A cell inside a feasible interval.</summary>
    public const char Feasible = '=';

    /// <summary>A cell outside every interval.</summary>
    public const char Infeasible = '-';

    /// <summary>The cell holding the recommended value.</summary>
    public const char Marker = '|';

    /// <summary>
    /// The bar, <paramref name="cells"/> (&gt;= 1) cells between brackets. A cell is feasible when intervals cover at
    /// least half of it; every interval, however narrow, marks at least the cell holding its midpoint, so none is
    /// lost to the resolution. Throws <see cref="ArgumentOutOfRangeException"/> for cells &lt; 1 and
    /// <see cref="ArgumentException"/> for an empty span.
    /// </summary>
    public static string Line(Interval span, IReadOnlyList<FeasibleInterval> intervals, double? recommended, int cells)
    {
        ArgumentNullException.ThrowIfNull(intervals);
        ArgumentOutOfRangeException.ThrowIfLessThan(cells, 1);
        if (!(span.Width > 0.0))
        {
            throw new ArgumentException("The span must have a positive width.", nameof(span));
        }

        double step = span.Width / cells;
        var bar = new char[cells];
        for (int i = 0; i < cells; i++)
        {
            double a = span.Low + (i * step), b = a + step;
            double covered = intervals.Sum(v => Math.Max(0.0, Math.Min(b, v.To) - Math.Max(a, v.From)));
            bar[i] = covered >= step / 2.0 ? Feasible : Infeasible;
        }

        foreach (var interval in intervals)
        {
            bar[CellOf(span, (interval.From + interval.To) / 2.0, cells)] = Feasible;
        }

        if (recommended is double r && span.Contains(r))
        {
            bar[CellOf(span, r, cells)] = Marker;
        }

        return new StringBuilder(cells + 2).Append('[').Append(bar).Append(']').ToString();
    }

    private static int CellOf(Interval span, double value, int cells) =>
        Math.Clamp((int)Math.Floor((value - span.Low) / span.Width * cells), 0, cells - 1);
}
