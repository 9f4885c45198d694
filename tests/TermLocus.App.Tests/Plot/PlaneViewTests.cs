using System.Numerics;
using TermLocus.App.Canvas;
using TermLocus.App.Plot;

namespace TermLocus.App.Tests.Plot;

public class PlaneViewTests
{
    private const double Tol = 1e-12;

    [Fact]
    public void Bounds_give_rows_twice_the_units_of_columns()
    {
        var view = new PlaneView(new Complex(-1, 0.5), 0.25);

        PlaneRect bounds = view.Bounds(40, 12);

        // 40 columns x 0.25 = 10 units wide; 12 rows x 0.5 = 6 units high.
        Assert.Equal(-6.0, bounds.MinReal, Tol);
        Assert.Equal(4.0, bounds.MaxReal, Tol);
        Assert.Equal(-2.5, bounds.MinImaginary, Tol);
        Assert.Equal(3.5, bounds.MaxImaginary, Tol);
    }

    [Theory]
    [InlineData(CanvasSymbols.Braille)]
    [InlineData(CanvasSymbols.Ascii)]
    public void One_unit_has_the_same_screen_length_across_and_down(CanvasSymbols symbols)
    {
        var view = new PlaneView(Complex.Zero, 0.05);
        DotMapping map = view.Mapping(80, 24, symbols);
        var canvas = new DotCanvas(80, 24, symbols);
        int dotsPerColumn = canvas.DotsPerColumn;
        int dotsPerRow = canvas.DotsPerRow;

        // Screen length in cell widths: dots / dots-per-cell, and a row is 2 cell widths tall (common practice:
        // terminal fonts are about twice as tall as wide).
        double across = (map.DotX(1) - map.DotX(-1)) / (double)dotsPerColumn;
        double down = (map.DotY(-1) - map.DotY(1)) / (double)dotsPerRow * 2;

        Assert.Equal(across, down, 1.0);
    }

    [Fact]
    public void Zoom_keeps_the_chosen_point_in_place_and_scales_the_span()
    {
        var view = new PlaneView(new Complex(-2, 0), 0.1);
        var about = new Complex(-3, 1);
        PlaneRect before = view.Bounds(40, 20);

        PlaneView zoomed = view.Zoom(2, about);
        PlaneRect after = zoomed.Bounds(40, 20);

        Assert.Equal(before.RealSpan / 2, after.RealSpan, Tol);
        Assert.Equal(Fraction(about.Real, before.MinReal, before.MaxReal), Fraction(about.Real, after.MinReal, after.MaxReal), Tol);
        Assert.Equal(
            Fraction(about.Imaginary, before.MinImaginary, before.MaxImaginary),
            Fraction(about.Imaginary, after.MinImaginary, after.MaxImaginary),
            Tol);
        Assert.Throws<ArgumentOutOfRangeException>(() => view.Zoom(0));
    }

    [Fact]
    public void Pan_moves_by_a_fraction_of_the_span()
    {
        var view = new PlaneView(Complex.Zero, 0.1);

        PlaneView moved = view.Pan(0.25, -0.5, 40, 10);

        // 40 x 0.1 = 4 wide, 10 x 0.2 = 2 high.
        Assert.Equal(1.0, moved.Centre.Real, Tol);
        Assert.Equal(-1.0, moved.Centre.Imaginary, Tol);
    }

    private static double Fraction(double value, double min, double max) => (value - min) / (max - min);
}
