using System.Collections.Immutable;
using System.Numerics;
using TermLocus.App.Canvas;

namespace TermLocus.App.Plot;

/// <summary>Draws a <see cref="PlaneScene"/> through a <see cref="PlaneView"/> onto a dot canvas. Pure: the same
/// inputs always give the same text, so the workbench and <c>termlocus plot</c> show identical pictures.</summary>
public static class PlaneRenderer
{
    /// <summary>Renders onto a fresh canvas of <paramref name="columns"/> × <paramref name="rows"/> cells.</summary>
    public static RenderedPlane Render(
        PlaneScene scene, PlaneView view, int columns, int rows, CanvasSymbols symbols, PlaneRenderOptions? options = null)
    {
        var canvas = new DotCanvas(columns, rows, symbols);
        RenderInto(canvas, scene, view, options);
        return RenderedPlane.From(canvas);
    }

    /// <summary>Clears <paramref name="canvas"/> and draws into it, reusing its memory (for redraws on every key).</summary>
    public static void RenderInto(DotCanvas canvas, PlaneScene scene, PlaneView view, PlaneRenderOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(canvas);
        ArgumentNullException.ThrowIfNull(scene);
        ArgumentNullException.ThrowIfNull(view);
        options ??= PlaneRenderOptions.Default;
        canvas.Clear();
        DotMapping map = view.Mapping(canvas.Columns, canvas.Rows, canvas.Symbols);
        double realStep = AxesPainter.RealStep(map.Bounds, canvas.Columns);
        double imaginaryStep = AxesPainter.ImaginaryStep(map.Bounds, canvas.Rows, realStep);
        AxesPainter.DrawLines(canvas, map, realStep, imaginaryStep, options);
        foreach (BoundaryCurve boundary in scene.Boundaries)
        {
            DrawPolyline(canvas, map, boundary.Points, new CellTag(CellLayer.SpecBoundary), DotPattern.Sparse);
        }

        foreach (ImmutableArray<Complex> trail in scene.BandTrails)
        {
            DrawPolyline(canvas, map, trail, new CellTag(CellLayer.BandTrail), DotPattern.Alternate);
        }

        foreach (PlaneBranch branch in scene.Branches)
        {
            DrawPolyline(canvas, map, branch.Points, CellTag.Branch(branch.Index), DotPattern.Solid);
        }

        DrawMarks(canvas, map, scene, PlaneGlyphs.For(canvas.Symbols));
        if (options.TickLabels)
        {
            AxesPainter.DrawLabels(canvas, map, realStep, imaginaryStep);
        }
    }

    private static void DrawMarks(DotCanvas canvas, in DotMapping map, PlaneScene scene, PlaneGlyphs glyphs)
    {
        foreach (Complex zero in scene.OpenLoopZeros)
        {
            PutMark(canvas, map, zero, glyphs.OpenLoopZero, new CellTag(CellLayer.OpenLoopZero));
        }

        foreach (Complex pole in scene.OpenLoopPoles)
        {
            PutMark(canvas, map, pole, glyphs.OpenLoopPole, new CellTag(CellLayer.OpenLoopPole));
        }

        foreach (CurrentPole pole in scene.CurrentPoles)
        {
            PutMark(
                canvas,
                map,
                pole.Position,
                pole.ViolatesSpecs ? glyphs.CurrentPoleViolating : glyphs.CurrentPole,
                new CellTag(pole.ViolatesSpecs ? CellLayer.CurrentPoleViolating : CellLayer.CurrentPole));
        }

        foreach (Complex marker in scene.Markers)
        {
            PutMark(canvas, map, marker, glyphs.Marker, new CellTag(CellLayer.Marker));
        }
    }

    private static void PutMark(DotCanvas canvas, in DotMapping map, Complex point, char glyph, CellTag tag)
    {
        if (!SegmentClipper.IsFinite(point) || !map.Bounds.Contains(point))
        {
            return;
        }

        (int x, int y) = map.Dot(point);
        canvas.PutGlyph(x / canvas.DotsPerColumn, y / canvas.DotsPerRow, glyph, tag);
    }

    private static void DrawPolyline(
        DotCanvas canvas, in DotMapping map, ImmutableArray<Complex> points, CellTag tag, DotPattern pattern)
    {
        if (points.Length == 1 && SegmentClipper.IsFinite(points[0]) && map.Bounds.Contains(points[0]))
        {
            (int x, int y) = map.Dot(points[0]);
            canvas.SetDot(x, y, tag);
            return;
        }

        int phase = 0;
        bool joined = false;
        (int X, int Y) previousEnd = default;
        for (int i = 1; i < points.Length; i++)
        {
            if (!SegmentClipper.TryClip(points[i - 1], points[i], map.Bounds, out Complex from, out Complex to)
                || !SegmentClipper.IsFinite(from) || !SegmentClipper.IsFinite(to))
            {
                joined = false;
                continue;
            }

            (int X, int Y) start = map.Dot(from);
            (int X, int Y) end = map.Dot(to);
            canvas.DrawSegment(start.X, start.Y, end.X, end.Y, tag, pattern, ref phase, joined && start == previousEnd);
            previousEnd = end;
            joined = true;
        }
    }
}
