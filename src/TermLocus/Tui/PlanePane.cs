using TermLocus.App.Canvas;
using TermLocus.App.Plot;
using TermLocus.App.Text;
using TermLocus.App.Workbench;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;

namespace TermLocus.Tui;

/// <summary>
/// The s-plane: draws the rendered plane cell by cell in the colour of what drew it. In compact layouts the last row
/// is a one-line legend. A click near a traced point picks that point's swept value.
/// </summary>
internal sealed class PlanePane : View
{
    private readonly Func<WorkbenchState> state;
    private readonly Action<Message> deliver;
    private readonly Palette palette;
    private readonly CanvasSymbols symbols;

    public PlanePane(Func<WorkbenchState> state, Action<Message> deliver, Palette palette, CanvasSymbols symbols)
    {
        this.state = state;
        this.deliver = deliver;
        this.palette = palette;
        this.symbols = symbols;
        CanFocus = false;
    }

    /// <summary>How many times the plane was drawn (tests check it is redrawn only when its inputs change).</summary>
    public int DrawCount { get; private set; }

    /// <summary>True when the last row shows the legend.</summary>
    public bool ShowsLegend { get; set; }

    private int PlotRows => Math.Max(0, Viewport.Height - (ShowsLegend ? 1 : 0));

    protected override bool OnDrawingContent(DrawContext? context)
    {
        int columns = Viewport.Width;
        int rows = PlotRows;
        if (columns <= 0 || rows <= 0)
        {
            return true;
        }

        DrawCount++;
        var plane = PlanePresenter.Render(state(), columns, rows, symbols);
        for (int row = 0; row < rows; row++)
        {
            string line = plane.Lines[row];
            foreach (var run in plane.Runs(row))
            {
                SetAttribute(palette.For(run.Tag));
                AddStr(run.Start, row, line.Substring(run.Start, run.Length));
            }
        }

        if (ShowsLegend)
        {
            SetAttribute(palette.For(Tone.Dim));
            AddStr(0, rows, TextWidth.PadRight(PlaneLegend.Line(symbols, columns), columns));
        }

        return true;
    }

    protected override bool OnMouseEvent(Mouse mouse)
    {
        if (!mouse.IsSingleClicked || mouse.Position is not { } at || at.Y >= PlotRows)
        {
            return false;
        }

        if (PlanePresenter.PickValue(state(), at.X, at.Y, Viewport.Width, PlotRows) is double value)
        {
            deliver(new ValuePicked(value));
        }

        return true;
    }
}
