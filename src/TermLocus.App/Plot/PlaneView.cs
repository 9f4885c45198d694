using System.Numerics;
using TermLocus.App.Canvas;

namespace TermLocus.App.Plot;

/// <summary>
/// Which part of the complex plane a plot shows, independent of the window size: a centre and a scale in real units
/// per character cell width. Terminal cells are about <see cref="CellAspect"/> times as tall as they are wide, so one
/// cell row spans <c>UnitsPerColumn × CellAspect</c> imaginary units; equal units then have equal lengths on screen and
/// circles look round whichever symbol set draws them. Resizing the window keeps centre and scale.
/// </summary>
/// <param name="Centre">The point shown in the middle of the plot.</param>
/// <param name="UnitsPerColumn">Real units across one cell, &gt; 0.</param>
/// <param name="CellAspect">Cell height divided by cell width, &gt; 0; about 2 on common terminal fonts.</param>
public sealed record PlaneView(Complex Centre, double UnitsPerColumn, double CellAspect = PlaneView.DefaultCellAspect)
{
    /// <summary>Typical terminal cell height over width.</summary>
    public const double DefaultCellAspect = 2.0;

    /// <summary>Imaginary units down one cell row.</summary>
    public double UnitsPerRow => UnitsPerColumn * CellAspect;

    /// <summary>The visible rectangle for a plot of <paramref name="columns"/> × <paramref name="rows"/> cells.</summary>
    public PlaneRect Bounds(int columns, int rows)
    {
        double halfWidth = columns * UnitsPerColumn / 2.0;
        double halfHeight = rows * UnitsPerRow / 2.0;
        return new PlaneRect(
            Centre.Real - halfWidth, Centre.Real + halfWidth, Centre.Imaginary - halfHeight, Centre.Imaginary + halfHeight);
    }

    /// <summary>A view that shows every finite point of <paramref name="points"/>, the origin and some of the right
    /// half-plane beside the imaginary axis, with a margin and a round scale. See <see cref="ViewFitting"/>.</summary>
    public static PlaneView Fit(IEnumerable<Complex> points, int columns, int rows, double cellAspect = DefaultCellAspect) =>
        ViewFitting.Fit(points, columns, rows, cellAspect);

    /// <summary>Zooms in by <paramref name="factor"/> (&gt; 1 magnifies, &lt; 1 shrinks) keeping
    /// <paramref name="about"/> at the same place on screen.</summary>
    public PlaneView Zoom(double factor, Complex about)
    {
        if (!(factor > 0) || double.IsInfinity(factor))
        {
            throw new ArgumentOutOfRangeException(nameof(factor), factor, "zoom factor must be positive and finite");
        }

        return this with { Centre = about + ((Centre - about) / factor), UnitsPerColumn = UnitsPerColumn / factor };
    }

    /// <summary>Zooms about the centre of the view.</summary>
    public PlaneView Zoom(double factor) => Zoom(factor, Centre);

    /// <summary>Moves the view right by <paramref name="rightFraction"/> of its width and up by
    /// <paramref name="upFraction"/> of its height (negative fractions move left / down).</summary>
    public PlaneView Pan(double rightFraction, double upFraction, int columns, int rows) =>
        this with
        {
            Centre = Centre + new Complex(
                rightFraction * columns * UnitsPerColumn, upFraction * rows * UnitsPerRow),
        };

    /// <summary>The dot grid of a canvas of this size and symbol set, for mapping points to dots.</summary>
    internal DotMapping Mapping(int columns, int rows, CanvasSymbols symbols) =>
        new(Bounds(columns, rows), columns * DotCells.DotsPerColumn, rows * DotCells.DotsPerRow(symbols));
}
