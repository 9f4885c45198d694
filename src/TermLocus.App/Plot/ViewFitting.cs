using System.Numerics;

namespace TermLocus.App.Plot;

/// <summary>The automatic view: bounding box of the points and the origin, a margin, room right of the imaginary
/// axis, then a round width and a centre snapped to a round step.</summary>
internal static class ViewFitting
{
    /// <summary>Fraction of the box's width (and height) added on each side.</summary>
    private const double MarginFraction = 0.1;

    /// <summary>Snap the centre to about 1/40 of the span, well inside the margin.</summary>
    private const int CentreSnapDivisions = 40;

    /// <summary>Half-width of the view when there is nothing but the origin to show.</summary>
    private const double DefaultHalfSpan = 1.0;

    public static PlaneView Fit(IEnumerable<Complex> points, int columns, int rows, double cellAspect)
    {
        ArgumentNullException.ThrowIfNull(points);
        ArgumentOutOfRangeException.ThrowIfLessThan(columns, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(rows, 1);
        if (!(cellAspect > 0) || double.IsInfinity(cellAspect))
        {
            throw new ArgumentOutOfRangeException(nameof(cellAspect), cellAspect, "cell aspect must be positive");
        }

        PlaneRect box = WithMargin(BoxWithOrigin(points));
        double unitsPerColumn = Math.Max(box.RealSpan / columns, box.ImaginarySpan / (rows * cellAspect));
        double width = NiceTicks.RoundSpanUp(unitsPerColumn * columns);
        unitsPerColumn = width / columns;
        double height = unitsPerColumn * cellAspect * rows;
        var centre = new Complex(
            Snap((box.MinReal + box.MaxReal) / 2, width),
            Snap((box.MinImaginary + box.MaxImaginary) / 2, height));
        return new PlaneView(centre, unitsPerColumn, cellAspect);
    }

    private static PlaneRect BoxWithOrigin(IEnumerable<Complex> points)
    {
        double minRe = 0, maxRe = 0, minIm = 0, maxIm = 0;
        foreach (Complex p in points)
        {
            if (!double.IsFinite(p.Real) || !double.IsFinite(p.Imaginary))
            {
                continue;
            }

            minRe = Math.Min(minRe, p.Real);
            maxRe = Math.Max(maxRe, p.Real);
            minIm = Math.Min(minIm, p.Imaginary);
            maxIm = Math.Max(maxIm, p.Imaginary);
        }

        if (maxRe - minRe == 0 && maxIm - minIm == 0)
        {
            return new PlaneRect(-DefaultHalfSpan, DefaultHalfSpan, -DefaultHalfSpan, DefaultHalfSpan);
        }

        return new PlaneRect(minRe, maxRe, minIm, maxIm);
    }

    // The margin is a share of the larger side, so a locus lying on the real axis (or only in the left half-plane)
    // still gets room around the imaginary axis rather than a jω axis glued to the edge.
    private static PlaneRect WithMargin(PlaneRect box)
    {
        double margin = MarginFraction * Math.Max(box.RealSpan, box.ImaginarySpan);
        return new PlaneRect(
            box.MinReal - margin, box.MaxReal + margin, box.MinImaginary - margin, box.MaxImaginary + margin);
    }

    private static double Snap(double value, double span)
    {
        double step = NiceTicks.Step(span, CentreSnapDivisions);
        double snapped = Math.Round(value / step) * step;
        return snapped == 0 ? 0.0 : snapped;
    }
}
