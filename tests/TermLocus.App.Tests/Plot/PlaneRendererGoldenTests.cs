using System.Numerics;
using TermLocus.App.Canvas;
using TermLocus.App.Plot;

namespace TermLocus.App.Tests.Plot;

// A small scene drawn at 40 x 12: open-loop poles at -1 ± j, a zero at -2, the ζ = 0.707 lines. The view spans
// real -4..1 (0.125 per column) and imaginary -1.5..1.5 (0.25 per row), so by hand: -1 + j falls in column
// (-1 + 4) / 0.125 = 24, row (1.5 - 1) / 0.25 = 2; -1 - j in column 24, row 10; -2 in column 16, row 6 (the real
// axis, whose dot row 24 of 48 is the top dot row of cell row 6); the imaginary axis is dot column 64 = column 32.
// The ζ = 0.707 line rises at 45° (acos 0.707) from the origin, so at Im = 1.5 (row 0) it is at Re = -1.5,
// column 20. The golden text below was checked against those positions.
public class PlaneRendererGoldenTests
{
    private static readonly PlaneScene Scene = new()
    {
        OpenLoopPoles = [new Complex(-1, 1), new Complex(-1, -1)],
        OpenLoopZeros = [new Complex(-2, 0)],
        Boundaries = [SPlaneBoundaries.Damping(0.707, 10)],
    };

    private static readonly PlaneView View = new(new Complex(-1.5, 0), 0.125);

    [Fact]
    public void Braille_golden()
    {
        RenderedPlane plane = PlaneRenderer.Render(Scene, View, 40, 12, CanvasSymbols.Braille);

        Assert.Equal(
            [
                "1.5             ⠁   ⠁⢀         ⠈⡏       ",
                "                       ⠄        ⡇       ",
                "1               ⠁       ×      ⠈⡏       ",
                "                          ⠁⢀    ⡇       ",
                "0.5             ⠁            ⠄ ⠈⡏       ",
                "⡀               ⡀             ⠐ ⡇       ",
                "0⠉⠉⠉⠉⠉⠉⠉⠉⠉⠉⠉⠉⠉⠉⠉○⠉⠉⠉⠉⠉⠉⠉⠉⠉⠉⠉⠉⠉⢉⠉⡏⠉⠉⠉⠉⠉⠉⠉",
                "                             ⠄  ⡇       ",
                "-0.5            ⠁          ⠐   ⠈⡏       ",
                "                        ⠠ ⠁     ⡇       ",
                "-1              ⠁      ⠂×      ⠈⡏       ",
                "-4             -2   ⡀⠈         ⢀0       ",
            ],
            plane.Lines);
    }

    [Fact]
    public void Ascii_golden()
    {
        RenderedPlane plane = PlaneRenderer.Render(Scene, View, 40, 12, CanvasSymbols.Ascii);

        Assert.Equal(
            [
                "1.5                 '          '+       ",
                "                     ' .        |       ",
                "1                       x      '+       ",
                "                          '     |       ",
                "0.5                        ' . '+       ",
                ".               .             . |       ",
                "0---------------o-------------+-+-------",
                "                             .  |       ",
                "-0.5                       '   '+       ",
                "                        . '     |       ",
                "-1                     'x      '+       ",
                "-4             -2   .'         .0       ",
            ],
            plane.Lines);
    }

    [Theory]
    [InlineData(CanvasSymbols.Braille, '×', '○')]
    [InlineData(CanvasSymbols.Ascii, 'x', 'o')]
    public void Marks_land_in_the_cells_worked_out_by_hand(CanvasSymbols symbols, char pole, char zero)
    {
        RenderedPlane plane = PlaneRenderer.Render(Scene, View, 40, 12, symbols);

        Assert.Equal(pole, plane.Lines[2][24]);
        Assert.Equal(pole, plane.Lines[10][24]);
        Assert.Equal(zero, plane.Lines[6][16]);
        Assert.Equal(new CellTag(CellLayer.OpenLoopPole), plane.TagAt(24, 2));
        Assert.Equal(new CellTag(CellLayer.OpenLoopZero), plane.TagAt(16, 6));
        Assert.Equal(new CellTag(CellLayer.SpecBoundary), plane.TagAt(20, 0));
        Assert.Equal(new CellTag(CellLayer.Axis), plane.TagAt(32, 3));
        Assert.Equal(new CellTag(CellLayer.Label), plane.TagAt(0, 11));
    }

    [Theory]
    [InlineData(CanvasSymbols.Braille)]
    [InlineData(CanvasSymbols.Ascii)]
    public void Every_line_is_full_width_and_empty_cells_are_spaces(CanvasSymbols symbols)
    {
        RenderedPlane plane = PlaneRenderer.Render(Scene, View, 40, 12, symbols);

        Assert.Equal(12, plane.Lines.Count);
        Assert.All(plane.Lines, line => Assert.Equal(40, line.Length));
        Assert.DoesNotContain(plane.Lines, line => line.Contains('\u2800', StringComparison.Ordinal));
        Assert.Equal(string.Join('\n', plane.Lines), plane.Text());
    }

    // A circle must look round: equal screen extent across and down. Screen extent in cell widths is dots across /
    // dots per column, and dots down / dots per row × 2 (a cell is about twice as tall as wide; common practice).
    [Theory]
    [InlineData(CanvasSymbols.Braille)]
    [InlineData(CanvasSymbols.Ascii)]
    public void A_circle_is_as_wide_as_it_is_tall_on_screen(CanvasSymbols symbols)
    {
        var circle = new PlaneScene { Branches = [new PlaneBranch(0, PlaneCurves.Circle(new Complex(-1.5, 0), 1))] };
        var canvas = new DotCanvas(40, 12, symbols);

        PlaneRenderer.RenderInto(canvas, circle, View, PlaneRenderOptions.SceneOnly);
        (int width, int height) = DotExtent(canvas);

        double across = width / (double)canvas.DotsPerColumn;
        double down = height / (double)canvas.DotsPerRow * 2;
        Assert.Equal(16.0, across, 1.0); // diameter 2 units / 0.125 per column
        Assert.Equal(across, down, 1.0);
        if (symbols == CanvasSymbols.Braille)
        {
            Assert.InRange(Math.Abs(width - height), 0, 2); // braille dots are about square
        }
    }

    private static (int Width, int Height) DotExtent(DotCanvas canvas)
    {
        int minX = int.MaxValue, maxX = -1, minY = int.MaxValue, maxY = -1;
        for (int y = 0; y < canvas.DotHeight; y++)
        {
            for (int x = 0; x < canvas.DotWidth; x++)
            {
                if (canvas.IsDotSet(x, y))
                {
                    (minX, maxX, minY, maxY) = (Math.Min(minX, x), Math.Max(maxX, x), Math.Min(minY, y), Math.Max(maxY, y));
                }
            }
        }

        return (maxX - minX + 1, maxY - minY + 1);
    }
}
