using Terminal.Gui.ViewBase;
using TextWidth = TermLocus.App.Text.TextWidth;

namespace TermLocus.Tui;

/// <summary>
/// A pane that draws the lines its content function gives for its current size, each in its tone, optionally inside
/// a frame with a heading. It remembers what it drew and writes only the lines that changed, so a key press sends
/// a few lines rather than the pane; <see cref="Invalidate"/> makes the next draw complete.
/// </summary>
internal sealed class TextPane : View
{
    private readonly Palette palette;
    private readonly FrameGlyphs? frame;
    private string heading = string.Empty;
    private List<StyledLine[]>? last;
    private (int Width, int Height) lastSize;

    public TextPane(Palette palette, FrameGlyphs? frame, Func<int, int, IReadOnlyList<StyledLine>> content)
    {
        this.palette = palette;
        this.frame = frame;
        Content = content;
        CanFocus = false;
    }

    /// <summary>Lines for the inner width and height (in cells).</summary>
    public Func<int, int, IReadOnlyList<StyledLine>> Content { get; set; }

    /// <summary>The heading shown in the frame's top edge.</summary>
    public string Heading
    {
        get => heading;
        set
        {
            if (value != heading)
            {
                heading = value;
                SetNeedsDraw();
            }
        }
    }

    /// <summary>Forget what is on screen: the next draw writes every cell (after something drew over the pane).</summary>
    public void Invalidate() => last = null;

    // The pane paints every cell itself; clearing first would make every cell count as changed.
    protected override bool OnClearingViewport() => true;

    protected override bool OnDrawingContent(DrawContext? context)
    {
        int width = Viewport.Width;
        int height = Viewport.Height;
        if (width <= 0 || height <= 0)
        {
            return true;
        }

        var rows = Rows(width, height);
        bool full = last is null || lastSize != (width, height);
        for (int row = 0; row < rows.Count; row++)
        {
            var before = full || row >= last!.Count ? null : last[row];
            if (before is not null && before.AsSpan().SequenceEqual(rows[row]))
            {
                continue;
            }

            int column = 0;
            for (int i = 0; i < rows[row].Length; i++)
            {
                var segment = rows[row][i];
                var (from, to) = ChangedSpan(segment, before is not null && before.Length == rows[row].Length ? before[i] : null);
                if (from <= to)
                {
                    SetAttribute(palette.For(segment.Tone));
                    AddStr(column + from, row, segment.Text.Substring(from, to - from + 1));
                }

                column += TextWidth.Of(segment.Text);
            }
        }

        last = rows;
        lastSize = (width, height);
        return true;
    }

    // The stretch of a segment that differs from what is on screen, as character indices; only for text of
    // single-width characters in the same tone and length (else the whole segment). Empty (from > to) when unchanged.
    private static (int From, int To) ChangedSpan(StyledLine now, StyledLine? was)
    {
        string text = now.Text;
        if (was is not { } before || before.Tone != now.Tone || before.Text.Length != text.Length || TextWidth.Of(text) != text.Length)
        {
            return (0, text.Length - 1);
        }

        int from = 0;
        while (from < text.Length && text[from] == before.Text[from])
        {
            from++;
        }

        int to = text.Length - 1;
        while (to >= from && text[to] == before.Text[to])
        {
            to--;
        }

        return (from, to);
    }

    private List<StyledLine[]> Rows(int width, int height)
    {
        bool framed = frame is not null && width >= 2 && height >= 2;
        int innerWidth = framed ? width - 2 : width;
        int innerHeight = framed ? height - 2 : height;
        var lines = Content(innerWidth, innerHeight);
        var rows = new List<StyledLine[]>(height);
        if (framed)
        {
            rows.Add([new StyledLine(frame!.Top(heading, width), Tone.Normal)]);
        }

        for (int i = 0; i < innerHeight; i++)
        {
            var line = i < lines.Count ? lines[i] : new StyledLine(string.Empty, Tone.Normal);
            var text = new StyledLine(TextWidth.PadRight(line.Text, innerWidth), line.Tone);
            rows.Add(framed
                ? [new StyledLine(frame!.Vertical, Tone.Normal), text, new StyledLine(frame.Vertical, Tone.Normal)]
                : [text]);
        }

        if (framed)
        {
            rows.Add([new StyledLine(frame!.Bottom(width), Tone.Normal)]);
        }

        return rows;
    }
}
