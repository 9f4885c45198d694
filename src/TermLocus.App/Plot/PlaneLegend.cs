using System.Text;
using TermLocus.App.Canvas;

namespace TermLocus.App.Plot;

/// <summary>A one-line key to the marks of a plane plot.</summary>
public static class PlaneLegend
{
    private const string Gap = "  ";

    /// <summary>
    /// The legend, e.g. "× open-loop pole  ○ zero  ● closed-loop pole  ▲ off spec  ⋯ spec limit", in the marks of
    /// <paramref name="symbols"/>. Items that would make the line longer than <paramref name="maxWidth"/> characters
    /// are left off from the end, whole.
    /// </summary>
    public static string Line(CanvasSymbols symbols, int maxWidth = int.MaxValue)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(maxWidth);
        PlaneGlyphs glyphs = PlaneGlyphs.For(symbols);
        string[] items =
        [
            $"{glyphs.OpenLoopPole} open-loop pole",
            $"{glyphs.OpenLoopZero} zero",
            $"{glyphs.CurrentPole} closed-loop pole",
            $"{glyphs.CurrentPoleViolating} off spec",
            $"{glyphs.DottedLine} spec limit",
        ];
        var line = new StringBuilder();
        foreach (string item in items)
        {
            int needed = line.Length == 0 ? item.Length : line.Length + Gap.Length + item.Length;
            if (needed > maxWidth)
            {
                break;
            }

            line.Append(line.Length == 0 ? string.Empty : Gap).Append(item);
        }

        return line.ToString();
    }
}
