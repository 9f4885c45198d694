using TermLocus.App.Text;

namespace TermLocus.Tui;

/// <summary>
/// The characters of a pane's frame. Panes draw their own frames (rather than Terminal.Gui's borders) so that a frame
/// is sent once and never again while only the pane's content changes, and so that ASCII terminals get ASCII frames.
/// </summary>
/// <param name="Horizontal">Top and bottom edges.</param>
/// <param name="Vertical">Left and right edges.</param>
/// <param name="TopLeft">Top-left corner.</param>
/// <param name="TopRight">Top-right corner.</param>
/// <param name="BottomLeft">Bottom-left corner.</param>
/// <param name="BottomRight">Bottom-right corner.</param>
/// <param name="TitleLeft">Before the title.</param>
/// <param name="TitleRight">After the title.</param>
internal sealed record FrameGlyphs(
    string Horizontal, string Vertical, string TopLeft, string TopRight, string BottomLeft, string BottomRight, string TitleLeft, string TitleRight)
{
    /// <summary>Box-drawing frames for UTF-8 terminals.</summary>
    public static FrameGlyphs Unicode { get; } = new("─", "│", "┌", "┐", "└", "┘", "┤", "├");

    /// <summary>Plain frames for other terminals.</summary>
    public static FrameGlyphs Ascii { get; } = new("-", "|", "+", "+", "+", "+", "[", "]");

    /// <summary>The top edge with <paramref name="title"/> in it, exactly <paramref name="width"/> columns.</summary>
    public string Top(string title, int width)
    {
        if (width < 2)
        {
            return TextWidth.PadRight(TopLeft, width);
        }

        string inner = title.Length == 0 ? string.Empty : TitleLeft + title + TitleRight;
        inner = TextWidth.Of(inner) > width - 2 ? TextWidth.Cut(inner, width - 2) : inner;
        return TopLeft + inner + Repeat(Horizontal, width - 2 - TextWidth.Of(inner)) + TopRight;
    }

    /// <summary>The bottom edge, exactly <paramref name="width"/> columns.</summary>
    public string Bottom(int width) =>
        width < 2 ? TextWidth.PadRight(BottomLeft, width) : BottomLeft + Repeat(Horizontal, width - 2) + BottomRight;

    private static string Repeat(string s, int count) => string.Concat(Enumerable.Repeat(s, Math.Max(0, count)));
}
