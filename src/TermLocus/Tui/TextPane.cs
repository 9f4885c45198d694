using Terminal.Gui.ViewBase;

namespace TermLocus.Tui;

/// <summary>
/// A pane that draws the lines its content function gives for its current size, each in its tone. It never reads
/// anything back; it is redrawn only when the screen says its inputs changed.
/// </summary>
internal sealed class TextPane : View
{
    private readonly Palette palette;

    public TextPane(Palette palette, Func<int, int, IReadOnlyList<StyledLine>> content)
    {
        this.palette = palette;
        Content = content;
        CanFocus = false;
    }

    /// <summary>Lines for a width and height (in cells).</summary>
    public Func<int, int, IReadOnlyList<StyledLine>> Content { get; set; }

    protected override bool OnDrawingContent(DrawContext? context)
    {
        int width = Viewport.Width;
        int height = Viewport.Height;
        if (width <= 0 || height <= 0)
        {
            return true;
        }

        var lines = Content(width, height);
        for (int row = 0; row < height; row++)
        {
            var line = row < lines.Count ? lines[row] : new StyledLine(string.Empty, Tone.Normal);
            SetAttribute(palette.For(line.Tone));
            AddStr(0, row, TermLocus.App.Text.TextWidth.PadRight(line.Text, width));
        }

        return true;
    }
}
