using System.Collections.Immutable;
using TermLocus.App.Canvas;
using TermLocus.Core.Time;

namespace TermLocus.App.Plot;

/// <summary>
/// A step response drawn on a dot canvas: the response, the ±2 % band about the steady state (dotted), the peak
/// marked, and time and value ticks; for a sampled loop also the sample instants, each a glyph on the curve, when
/// they lie far enough apart to tell. Shared by <c>termlocus response</c> and the workbench's response pane.
/// </summary>
public static class ResponsePlot
{
    /// <summary>Sample instants are marked only when at least this many character columns apart.</summary>
    public const double MinimumMarkSpacingColumns = 2.0;

    private const int LabelWidth = 7;

    /// <summary>
    /// The plot of <paramref name="outputs"/> against <paramref name="times"/> (seconds, increasing, same length,
    /// at least 2) in a <paramref name="columns"/> × <paramref name="rows"/> area (at least 10 × 4).
    /// <paramref name="steadyState"/> and <paramref name="peakTime"/> may be null (then no band or peak is drawn).
    /// Non-finite samples are skipped.
    /// </summary>
    public static IReadOnlyList<string> Render(
        IReadOnlyList<double> times, IReadOnlyList<double> outputs, double? steadyState, double? peakTime,
        int columns, int rows, CanvasSymbols symbols) =>
        Render(times, outputs, steadyState, peakTime, columns, rows, symbols, null);

    /// <summary>
    /// As the other overload, with the sample instants <paramref name="samples"/> (times on the same axis, null for
    /// none) marked on the curve ('•', or 'o' in ASCII) when <see cref="MarksSamples"/> says they can be told apart.
    /// The peak marker wins a cell both want.
    /// </summary>
    public static IReadOnlyList<string> Render(
        IReadOnlyList<double> times, IReadOnlyList<double> outputs, double? steadyState, double? peakTime,
        int columns, int rows, CanvasSymbols symbols, ResponseTrace? samples)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(columns, 10);
        ArgumentOutOfRangeException.ThrowIfLessThan(rows, 4);
        var canvas = new DotCanvas(columns - LabelWidth, rows - 1, symbols);
        double t0 = times[0], t1 = Math.Max(times[^1], t0 + 1e-12);
        var finite = outputs.Where(double.IsFinite).ToArray();
        double lo = Math.Min(0.0, finite.Length > 0 ? finite.Min() : 0.0);
        double hi = Math.Max(steadyState ?? 0.0, finite.Length > 0 ? finite.Max() : 1.0);
        if (hi - lo < 1e-12)
        {
            hi = lo + 1.0;
        }

        hi += 0.05 * (hi - lo);
        int X(double t) => (int)Math.Round((t - t0) / (t1 - t0) * (canvas.DotWidth - 1));
        int Y(double y) => (int)Math.Round((hi - y) / (hi - lo) * (canvas.DotHeight - 1));
        canvas.DrawLine(0, Y(0), canvas.DotWidth - 1, Y(0), new CellTag(CellLayer.Axis));
        if (steadyState is double ss)
        {
            foreach (double edge in new[] { ss * 0.98, ss * 1.02 })
            {
                canvas.DrawLine(0, Y(edge), canvas.DotWidth - 1, Y(edge), new CellTag(CellLayer.SpecBoundary), DotPattern.Sparse);
            }
        }

        DrawTrace(canvas, times, outputs, X, Y);
        if (samples is not null && MarksSamples(samples, times, columns))
        {
            MarkSamples(canvas, samples, X, Y);
        }

        if (peakTime is double tp && steadyState is not null)
        {
            int i = Nearest(times, tp);
            canvas.PutGlyph(X(times[i]) / canvas.DotsPerColumn, Y(outputs[i]) / canvas.DotsPerRow,
                symbols == CanvasSymbols.Braille ? '◆' : '@', new CellTag(CellLayer.Marker));
        }

        return Frame(canvas.Lines(), lo, hi, t0, t1, columns, LabelWidth);
    }

    /// <summary>
    /// True when the instants of <paramref name="samples"/> lie at least <see cref="MinimumMarkSpacingColumns"/>
    /// columns apart on a plot of <paramref name="times"/> <paramref name="columns"/> wide (value labels included).
    /// </summary>
    public static bool MarksSamples(ResponseTrace samples, IReadOnlyList<double> times, int columns)
    {
        ArgumentNullException.ThrowIfNull(samples);
        ArgumentNullException.ThrowIfNull(times);
        if (samples.Count < 2 || times.Count < 2 || columns <= LabelWidth)
        {
            return false;
        }

        double span = times[^1] - times[0];
        double spacing = (samples.Times[1] - samples.Times[0]) / span * (columns - LabelWidth);
        return span > 0.0 && spacing >= MinimumMarkSpacingColumns;
    }

    private static void MarkSamples(DotCanvas canvas, ResponseTrace samples, Func<double, int> x, Func<double, int> y)
    {
        char dot = canvas.Symbols == CanvasSymbols.Braille ? '•' : 'o';
        for (int k = 0; k < samples.Count; k++)
        {
            if (double.IsFinite(samples.Outputs[k]))
            {
                canvas.PutGlyph(x(samples.Times[k]) / canvas.DotsPerColumn, y(samples.Outputs[k]) / canvas.DotsPerRow, dot, new CellTag(CellLayer.CurrentPole));
            }
        }
    }

    private static void DrawTrace(DotCanvas canvas, IReadOnlyList<double> times, IReadOnlyList<double> outputs, Func<double, int> x, Func<double, int> y)
    {
        int? px = null, py = null;
        for (int i = 0; i < times.Count; i++)
        {
            if (!double.IsFinite(outputs[i]))
            {
                px = null;
                continue;
            }

            int cx = x(times[i]), cy = y(outputs[i]);
            if (px is int ax && py is int ay)
            {
                canvas.DrawLine(ax, ay, cx, cy, CellTag.Branch(0));
            }

            (px, py) = (cx, cy);
        }
    }

    private static int Nearest(IReadOnlyList<double> times, double t)
    {
        int best = 0;
        for (int i = 1; i < times.Count; i++)
        {
            if (Math.Abs(times[i] - t) < Math.Abs(times[best] - t))
            {
                best = i;
            }
        }

        return best;
    }

    // Value labels on the left (top and bottom), time ticks along the bottom line.
    private static ImmutableArray<string> Frame(IReadOnlyList<string> plot, double lo, double hi, double t0, double t1, int columns, int labelWidth)
    {
        var lines = ImmutableArray.CreateBuilder<string>();
        for (int r = 0; r < plot.Count; r++)
        {
            string label = r == 0 ? TickLabel.Format(hi, NiceTicks.Step(hi - lo, 4))
                : r == plot.Count - 1 ? TickLabel.Format(lo, NiceTicks.Step(hi - lo, 4)) : string.Empty;
            lines.Add(label.PadLeft(labelWidth - 1)[..(labelWidth - 1)] + " " + plot[r]);
        }

        var axis = new char[columns];
        Array.Fill(axis, ' ');
        double step = NiceTicks.Step(t1 - t0, Math.Max(2, (columns - labelWidth) / 12));
        foreach (double t in NiceTicks.Multiples(t0, t1, step))
        {
            string text = TickLabel.Format(t, step);
            int at = labelWidth + (int)Math.Round((t - t0) / (t1 - t0) * (columns - labelWidth - 1));
            if (at + text.Length <= columns)
            {
                text.CopyTo(0, axis, at, text.Length);
            }
        }

        string tail = " s";
        lines.Add(new string(axis).TrimEnd() + tail);
        return lines.ToImmutable();
    }
}
