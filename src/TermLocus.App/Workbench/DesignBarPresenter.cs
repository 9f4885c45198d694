using TermLocus.App.Reports;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>
/// The line under the plane: the feasible intervals of the swept range as the design report's bar
/// (<see cref="DesignBar"/>: <c>=</c> feasible, <c>-</c> not, <c>|</c> the recommended value), with the value being
/// looked at marked on it, and the recommended value that <c>d</c> jumps to.
/// </summary>
public static class DesignBarPresenter
{
    private const int MinimumCells = 8;
    private const int ComfortableCells = 20;

    /// <summary>The line, exactly <paramref name="width"/> columns; null when the plant has no design to show.</summary>
    public static string? Line(PlantSession? session, int width, Glyphs g)
    {
        if (session is null || session.Loaded.Model is null)
        {
            return null;
        }

        string name = session.Sweep.Name;
        string text = session.Design switch
        {
            null => $"feasible {name}: working it out{g.Ellipsis}",
            { Result: null, Problem: var problem } => $"feasible {name}: no design ({SafeText.Visible(problem ?? "unknown")})",
            { Result: { } result } => Bar(result, session.Sweep.Value, name, width, g),
        };
        return TextWidth.PadRight(SafeText.Fit(text, width, g.Ellipsis), width);
    }

    private static string Bar(Core.Analysis.DesignResult result, double value, string name, int width, Glyphs g)
    {
        string suffix = result.Recommended is { } r && result.Widest is { } w
            ? $" {NumberText.Short(w.From, 4)}..{NumberText.Short(w.To, 4)} d {NumberText.Exact(r.Value)}"
            : " none";

        // "feasible" goes first when room is short: the bar's cells say more.
        string prefix = $"feasible {name} ";
        if (width - TextWidth.Of(prefix) - TextWidth.Of(suffix) - 2 < ComfortableCells)
        {
            prefix = name + " ";
        }

        int cells = Math.Min(60, width - TextWidth.Of(prefix) - TextWidth.Of(suffix) - 2);
        if (cells < MinimumCells || !(result.Span.Width > 0))
        {
            return prefix.TrimEnd() + suffix;
        }

        var bar = DesignBar.Line(result.Span, result.Intervals, result.Recommended?.Value, cells)[1..^1].ToCharArray();
        int? valueCell = result.Span.Contains(value) ? CellOf(result.Span, value, cells) : null;
        KeepIntervalsVisible(bar, result, valueCell);
        var cellText = bar.Select((c, i) => i == valueCell ? g.BarMarker : c.ToString());
        return prefix + "[" + string.Concat(cellText) + "]" + suffix;
    }

    // The markers (recommended value, value on screen) may cover the only cell of a narrow interval: every interval
    // keeps one '=' of its own, in its cells if one is free, else in the free cell beside them.
    private static void KeepIntervalsVisible(char[] bar, Core.Analysis.DesignResult result, int? valueCell)
    {
        bool Free(int c) => c >= 0 && c < bar.Length && c != valueCell && bar[c] != DesignBar.Marker;
        foreach (var interval in result.Intervals)
        {
            int low = CellOf(result.Span, interval.From, bar.Length), high = CellOf(result.Span, interval.To, bar.Length);
            if (Enumerable.Range(low, high - low + 1).Any(c => bar[c] == DesignBar.Feasible && c != valueCell))
            {
                continue;
            }

            int? spare = Enumerable.Range(low, high - low + 1).Concat([high + 1, low - 1, high + 2, low - 2])
                .Where(Free).Select(c => (int?)c).FirstOrDefault();
            if (spare is int c)
            {
                bar[c] = DesignBar.Feasible;
            }
        }
    }

    private static int CellOf(Core.Plants.Interval span, double value, int cells) =>
        Math.Clamp((int)Math.Floor((value - span.Low) / span.Width * cells), 0, cells - 1);
}
