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
            ? $" {NumberText.Short(w.From, 4)}..{NumberText.Short(w.To, 4)} d {NumberText.Short(r.Value, 4)}"
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

        var bar = DesignBar.Line(result.Span, result.Intervals, result.Recommended?.Value, cells).ToCharArray();
        string line = prefix + new string(bar) + suffix;
        if (result.Span.Contains(value))
        {
            // The value on screen, in the bar's own cell: 1 + the slice of the span it falls in.
            int cell = Math.Clamp((int)((value - result.Span.Low) / result.Span.Width * cells), 0, cells - 1);
            int at = prefix.Length + 1 + cell;
            line = line[..at] + g.BarMarker + line[(at + 1)..];
        }

        return line;
    }
}
