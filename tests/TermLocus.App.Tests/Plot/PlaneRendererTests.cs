using System.Numerics;
using TermLocus.App.Canvas;
using TermLocus.App.Plot;

namespace TermLocus.App.Tests.Plot;

public class PlaneRendererTests
{
    // Real -4..1, imaginary -1.5..1.5 at 40 x 12; braille: 16 dots per real unit, 16 per imaginary unit.
    private static readonly PlaneView View = new(new Complex(-1.5, 0), 0.125);

    [Fact]
    public void A_branch_running_off_to_infinity_is_drawn_up_to_the_edge()
    {
        var scene = new PlaneScene { Branches = [new PlaneBranch(3, [new Complex(-1, 0.5), new Complex(1e9, 0.5)])] };
        var canvas = new DotCanvas(40, 12, CanvasSymbols.Braille);

        PlaneRenderer.RenderInto(canvas, scene, View, PlaneRenderOptions.SceneOnly);

        // Im = 0.5 is dot row (1.5 - 0.5) * 16 = 16; Re = -1 is dot column 48.
        Assert.False(canvas.IsDotSet(47, 16));
        Assert.All(Enumerable.Range(48, 32), x => Assert.True(canvas.IsDotSet(x, 16), $"dot {x}"));
        Assert.Equal(CellTag.Branch(3), canvas.TagAt(39, 4));
    }

    [Fact]
    public void A_segment_entirely_outside_the_view_draws_nothing()
    {
        // Without clipping, clamping both ends to the edge would draw a false line along the top row.
        var scene = new PlaneScene
        {
            Branches = [new PlaneBranch(0, [new Complex(-10, 100), new Complex(10, 100)])],
            BandTrails = [[new Complex(5, -5), new Complex(8, 3)]],
        };

        RenderedPlane plane = PlaneRenderer.Render(scene, View, 40, 12, CanvasSymbols.Braille, PlaneRenderOptions.SceneOnly);

        Assert.All(plane.Lines, line => Assert.Equal(new string(' ', 40), line));
    }

    [Fact]
    public void A_segment_crossing_the_whole_view_is_drawn_edge_to_edge()
    {
        var scene = new PlaneScene { Branches = [new PlaneBranch(0, [new Complex(-100, 0.5), new Complex(100, 0.5)])] };
        var canvas = new DotCanvas(40, 12, CanvasSymbols.Braille);

        PlaneRenderer.RenderInto(canvas, scene, View, PlaneRenderOptions.SceneOnly);

        Assert.True(canvas.IsDotSet(0, 16));
        Assert.True(canvas.IsDotSet(79, 16));
    }

    [Theory]
    [InlineData(CanvasSymbols.Braille, '●', '▲', '◆')]
    [InlineData(CanvasSymbols.Ascii, '#', '!', '@')]
    public void Current_poles_and_markers_sit_above_open_loop_marks(
        CanvasSymbols symbols, char current, char violating, char marker)
    {
        var scene = new PlaneScene
        {
            OpenLoopPoles = [new Complex(-1, 1), new Complex(-1, -1)],
            CurrentPoles = [new CurrentPole(new Complex(-1, 1)), new CurrentPole(new Complex(-1, -1), ViolatesSpecs: true)],
            Markers = [new Complex(-3, 1)],
        };

        RenderedPlane plane = PlaneRenderer.Render(scene, View, 40, 12, symbols);

        Assert.Equal(current, plane.Lines[2][24]);
        Assert.Equal(violating, plane.Lines[10][24]);
        Assert.Equal(marker, plane.Lines[2][8]);
        Assert.Equal(new CellTag(CellLayer.CurrentPoleViolating), plane.TagAt(24, 10));
        Assert.Equal(new CellTag(CellLayer.Marker), plane.TagAt(8, 2));
    }

    [Fact]
    public void A_tick_label_that_would_cut_a_mark_is_left_out()
    {
        // Re = -2 in the bottom row: the "-2" label would cover columns 15..16; the zero at column 16 wins.
        var scene = new PlaneScene { OpenLoopZeros = [new Complex(-2, -1.4)] };

        RenderedPlane plane = PlaneRenderer.Render(scene, View, 40, 12, CanvasSymbols.Ascii);

        string bottom = plane.Lines[11];
        Assert.Equal('o', bottom[16]);
        Assert.DoesNotContain("-2", bottom, StringComparison.Ordinal);
        Assert.StartsWith("-4", bottom, StringComparison.Ordinal);
        Assert.Equal('0', bottom[32]);
    }

    [Fact]
    public void Marks_outside_the_view_are_not_pinned_to_the_edge()
    {
        var scene = new PlaneScene { OpenLoopPoles = [new Complex(-50, 0), new Complex(double.NaN, 0)] };

        RenderedPlane plane = PlaneRenderer.Render(scene, View, 40, 12, CanvasSymbols.Ascii);

        Assert.DoesNotContain(plane.Lines, line => line.Contains('x', StringComparison.Ordinal));
    }

    [Fact]
    public void Band_trails_and_boundaries_are_dotted_and_branches_solid()
    {
        Complex[] path = [new Complex(-3.5, 0.5), new Complex(0.5, 0.5)];
        int Count(PlaneScene scene)
        {
            var canvas = new DotCanvas(40, 12, CanvasSymbols.Braille);
            PlaneRenderer.RenderInto(canvas, scene, View, PlaneRenderOptions.SceneOnly);
            return Enumerable.Range(0, canvas.DotWidth).Count(x => canvas.IsDotSet(x, 16));
        }

        int solid = Count(new PlaneScene { Branches = [new PlaneBranch(0, [.. path])] });
        int trail = Count(new PlaneScene { BandTrails = [[.. path]] });
        int limit = Count(new PlaneScene { Boundaries = [new BoundaryCurve(BoundaryKind.DecayRate, [.. path])] });

        Assert.Equal(65, solid); // 4 units x 16 dots, both ends
        Assert.Equal(33, trail);
        Assert.Equal(22, limit);
    }

    [Fact]
    public void Runs_split_a_row_by_colour()
    {
        var scene = new PlaneScene { OpenLoopPoles = [new Complex(-1, 1)] };

        RenderedPlane plane = PlaneRenderer.Render(scene, View, 40, 12, CanvasSymbols.Ascii, PlaneRenderOptions.SceneOnly);

        Assert.Equal(
            [new TagRun(0, 24, CellTag.None), new TagRun(24, 1, new CellTag(CellLayer.OpenLoopPole)), new TagRun(25, 15, CellTag.None)],
            plane.Runs(2));
    }

    [Fact]
    public void Rendering_into_a_reused_canvas_matches_a_fresh_render()
    {
        var first = new PlaneScene { OpenLoopPoles = [new Complex(-3, 1)] };
        var second = new PlaneScene { OpenLoopZeros = [new Complex(-1, 0)] };
        var canvas = new DotCanvas(40, 12, CanvasSymbols.Braille);

        PlaneRenderer.RenderInto(canvas, first, View);
        PlaneRenderer.RenderInto(canvas, second, View);

        Assert.Equal(PlaneRenderer.Render(second, View, 40, 12, CanvasSymbols.Braille).Lines, canvas.Lines());
    }
}
