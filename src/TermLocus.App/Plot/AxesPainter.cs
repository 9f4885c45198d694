using TermLocus.App.Canvas;

namespace TermLocus.App.Plot;

/// <summary>Grid dots, the two axes with tick marks, and tick labels along the bottom and left edges.</summary>
internal static class AxesPainter
{
    /// <summary>Room per real-axis label, in cells.</summary>
    private const int ColumnsPerTick = 10;

    /// <summary>Rows per imaginary-axis label: one for the label, one blank.</summary>
    private const int RowsPerTick = 2;

    /// <summary>Fewer imaginary ticks than this and the axis gets its own, finer step.</summary>
    private const int MinImaginaryTicks = 3;

    private static readonly CellTag AxisTag = new(CellLayer.Axis);
    private static readonly CellTag GridTag = new(CellLayer.Grid);
    private static readonly CellTag LabelTag = new(CellLayer.Label);

    public static double RealStep(PlaneRect bounds, int columns) =>
        NiceTicks.Step(bounds.RealSpan, Math.Max(1, columns / ColumnsPerTick));

    /// <summary>The real step when it gives the imaginary axis enough ticks (a square grid), else a finer one.</summary>
    public static double ImaginaryStep(PlaneRect bounds, int rows, double realStep)
    {
        if (NiceTicks.Multiples(bounds.MinImaginary, bounds.MaxImaginary, realStep).Count >= MinImaginaryTicks)
        {
            return realStep;
        }

        return NiceTicks.Step(bounds.ImaginarySpan, Math.Max(1, rows / RowsPerTick));
    }

    public static void DrawLines(
        DotCanvas canvas, in DotMapping map, double realStep, double imaginaryStep, PlaneRenderOptions options)
    {
        PlaneRect bounds = map.Bounds;
        IReadOnlyList<double> realTicks = NiceTicks.Multiples(bounds.MinReal, bounds.MaxReal, realStep);
        IReadOnlyList<double> imaginaryTicks = NiceTicks.Multiples(bounds.MinImaginary, bounds.MaxImaginary, imaginaryStep);

        // ASCII has too few dots per cell for a grid to stay quiet; the axes and labels carry the scale there.
        if (options.Grid && canvas.Symbols == CanvasSymbols.Braille)
        {
            DrawGrid(canvas, map, realTicks, imaginaryTicks);
        }

        if (options.Axes)
        {
            DrawAxes(canvas, map, realTicks, imaginaryTicks);
        }
    }

    private static void DrawGrid(
        DotCanvas canvas, in DotMapping map, IReadOnlyList<double> realTicks, IReadOnlyList<double> imaginaryTicks)
    {
        foreach (double re in realTicks)
        {
            foreach (double im in imaginaryTicks)
            {
                canvas.SetDot(map.DotX(re), map.DotY(im), GridTag);
            }
        }
    }

    private static void DrawAxes(
        DotCanvas canvas, in DotMapping map, IReadOnlyList<double> realTicks, IReadOnlyList<double> imaginaryTicks)
    {
        PlaneRect bounds = map.Bounds;
        if (bounds.MinImaginary <= 0 && bounds.MaxImaginary >= 0)
        {
            int y = map.DotY(0);
            canvas.DrawLine(0, y, map.DotWidth - 1, y, AxisTag);
            foreach (double re in realTicks)
            {
                canvas.SetDot(map.DotX(re), y - 1, AxisTag);
                canvas.SetDot(map.DotX(re), y + 1, AxisTag);
            }
        }

        if (bounds.MinReal <= 0 && bounds.MaxReal >= 0)
        {
            int x = map.DotX(0);
            canvas.DrawLine(x, 0, x, map.DotHeight - 1, AxisTag);
            foreach (double im in imaginaryTicks)
            {
                canvas.SetDot(x - 1, map.DotY(im), AxisTag);
                canvas.SetDot(x + 1, map.DotY(im), AxisTag);
            }
        }
    }

    /// <summary>Labels go on last and only into cells without a glyph, so they never cut a pole mark in half.</summary>
    public static void DrawLabels(DotCanvas canvas, in DotMapping map, double realStep, double imaginaryStep)
    {
        PlaneRect bounds = map.Bounds;
        int bottom = canvas.Rows - 1;
        int nextFree = 0;
        foreach (double re in NiceTicks.Multiples(bounds.MinReal, bounds.MaxReal, realStep))
        {
            string text = TickLabel.Format(re, realStep);
            int column = (map.DotX(re) / canvas.DotsPerColumn) - (text.Length / 2);
            column = Math.Clamp(column, 0, Math.Max(0, canvas.Columns - text.Length));
            if (column >= nextFree && !canvas.HasGlyphs(column, bottom, text.Length))
            {
                canvas.PutText(column, bottom, text, LabelTag);
                nextFree = column + text.Length + 1;
            }
        }

        foreach (double im in NiceTicks.Multiples(bounds.MinImaginary, bounds.MaxImaginary, imaginaryStep))
        {
            string text = TickLabel.Format(im, imaginaryStep);
            int row = map.DotY(im) / canvas.DotsPerRow;
            if (row < bottom && !canvas.HasGlyphs(0, row, text.Length))
            {
                canvas.PutText(0, row, text, LabelTag);
            }
        }
    }
}
