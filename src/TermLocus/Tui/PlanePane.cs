using TermLocus.App.Canvas;
using TermLocus.App.Plot;
using TermLocus.App.Text;
using TermLocus.App.Workbench;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;

namespace TermLocus.Tui;

/// <summary>
/// The s-plane in its frame: draws the rendered plane cell by cell in the colour of what drew it, writing only the
/// cells that changed since the last draw. In compact layouts the last row is a one-line legend. A click near a
/// traced point picks that point's swept value.
/// </summary>
internal sealed class PlanePane : View
{
    private readonly Func<WorkbenchState> state;
    private readonly Action<Message> deliver;
    private readonly Palette palette;
    private readonly CanvasSymbols symbols;
    private readonly FrameGlyphs frame;
    private readonly Glyphs glyphs;
    private string heading = string.Empty;
    private RenderedPlane? last;
    private string? lastBar;
    private (int Width, int Height, bool Legend, bool Bar) lastFrame;
    private string lastHeading = string.Empty;

    public PlanePane(Func<WorkbenchState> state, Action<Message> deliver, Palette palette, CanvasSymbols symbols, FrameGlyphs frame)
    {
        this.state = state;
        this.deliver = deliver;
        this.palette = palette;
        this.symbols = symbols;
        this.frame = frame;
        glyphs = symbols == CanvasSymbols.Braille ? Glyphs.Unicode : Glyphs.Ascii;
        CanFocus = false;
    }

    /// <summary>How many times the plane was drawn (tests check it is redrawn only when its inputs change).</summary>
    public int DrawCount { get; private set; }

    /// <summary>True when the last row shows the legend.</summary>
    public bool ShowsLegend { get; set; }

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

    private int PlotColumns => Math.Max(0, Viewport.Width - 2);

    private int PlotRows => Math.Max(0, Viewport.Height - 2 - (ShowsLegend ? 1 : 0) - (ShowsDesignBar ? 1 : 0));

    // The feasible-interval bar sits under the plot whenever the plant has a loop model to design with.
    private bool ShowsDesignBar => state().Session?.Loaded.Model is not null;

    /// <summary>Forget what is on screen: the next draw writes every cell (after something drew over the pane).</summary>
    public void Invalidate() => last = null;

    // The pane paints every cell itself; clearing first would make every cell count as changed.
    protected override bool OnClearingViewport() => true;

    protected override bool OnDrawingContent(DrawContext? context)
    {
        int columns = PlotColumns;
        int rows = PlotRows;
        if (columns <= 0 || rows <= 0)
        {
            return true;
        }

        DrawCount++;
        var currentFrame = (Viewport.Width, Viewport.Height, ShowsLegend, ShowsDesignBar);
        bool full = last is null || last.Columns != columns || last.Rows != rows || lastFrame != currentFrame;
        if (full)
        {
            DrawFrame(columns, rows);
        }
        else if (heading != lastHeading)
        {
            // "tracing…" comes and goes with each trace: only the top edge changes, not the plot.
            SetAttribute(palette.For(Tone.Normal));
            AddStr(0, 0, frame.Top(heading, Viewport.Width));
        }

        lastHeading = heading;

        string? bar = DesignBarPresenter.Line(state().Session, columns, glyphs);
        if (bar is not null && (full || bar != lastBar))
        {
            SetAttribute(palette.For(Tone.Normal));
            AddStr(1, rows + 1, bar);
        }

        lastBar = bar;

        var plane = PlanePresenter.Render(state(), columns, rows, symbols);
        for (int row = 0; row < rows; row++)
        {
            // Only the changed stretch of each row is written, so a step sends a few cells, not the whole plot.
            var (from, to) = full ? (0, columns - 1) : ChangedSpan(plane, last!, row);
            DrawSpan(plane, row, from, to);
        }

        last = plane;
        lastFrame = currentFrame;
        return true;
    }

    protected override bool OnMouseEvent(Mouse mouse)
    {
        if (!mouse.IsSingleClicked || mouse.Position is not { } at)
        {
            return false;
        }

        int column = at.X - 1;
        int row = at.Y - 1;
        if (column < 0 || row < 0 || column >= PlotColumns || row >= PlotRows)
        {
            return false;
        }

        if (PlanePresenter.PickValue(state(), column, row, PlotColumns, PlotRows) is double value)
        {
            deliver(new ValuePicked(value));
        }

        return true;
    }

    private static (int From, int To) ChangedSpan(RenderedPlane now, RenderedPlane before, int row)
    {
        string a = now.Lines[row];
        string b = before.Lines[row];
        int from = 0;
        while (from < a.Length && a[from] == b[from] && now.TagAt(from, row) == before.TagAt(from, row))
        {
            from++;
        }

        int to = a.Length - 1;
        while (to > from && a[to] == b[to] && now.TagAt(to, row) == before.TagAt(to, row))
        {
            to--;
        }

        return (from, to);
    }

    private void DrawSpan(RenderedPlane plane, int row, int from, int to)
    {
        string line = plane.Lines[row];
        foreach (var run in plane.Runs(row))
        {
            int start = Math.Max(run.Start, from);
            int end = Math.Min(run.Start + run.Length - 1, to);
            if (start <= end)
            {
                SetAttribute(palette.For(run.Tag));
                AddStr(start + 1, row + 1, line.Substring(start, end - start + 1));
            }
        }
    }

    private void DrawFrame(int columns, int rows)
    {
        int width = Viewport.Width;
        int height = Viewport.Height;
        SetAttribute(palette.For(Tone.Normal));
        AddStr(0, 0, frame.Top(heading, width));
        for (int row = 1; row < height - 1; row++)
        {
            AddStr(0, row, frame.Vertical);
            AddStr(width - 1, row, frame.Vertical);
        }

        AddStr(0, height - 1, frame.Bottom(width));
        if (ShowsLegend)
        {
            SetAttribute(palette.For(Tone.Dim));
            AddStr(1, rows + 1 + (ShowsDesignBar ? 1 : 0), TextWidth.PadRight(PlaneLegend.Line(symbols, columns), columns));
        }
    }
}
