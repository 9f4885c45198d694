using System.Numerics;
using CsCheck;
using TermLocus.App.Plot;

namespace TermLocus.App.Tests.Plot;

public class ViewFittingTests
{
    private const double Tol = 1e-9;

    [Fact]
    public void Fit_shows_every_point_the_origin_and_room_right_of_the_imaginary_axis()
    {
        Complex[] points = [new(-1, 1), new(-1, -1), new(-2, 0), new(-8, 0)];

        PlaneRect bounds = PlaneView.Fit(points, 40, 12).Bounds(40, 12);

        Assert.All(points, p => Assert.True(bounds.Contains(p), $"{p} outside {bounds}"));
        Assert.True(bounds.MaxReal > 0.05 * bounds.RealSpan, $"imaginary axis at the edge: {bounds}");
        Assert.True(bounds.MinReal < -8 - (0.03 * bounds.RealSpan), $"no margin on the left: {bounds}");
    }

    [Fact]
    public void Fit_gives_a_round_width_and_a_centred_real_axis_for_a_symmetric_locus()
    {
        Complex[] points = [new(-3, 2.2), new(-3, -2.2), new(-0.5, 0)];

        PlaneView view = PlaneView.Fit(points, 60, 20);
        PlaneRect bounds = view.Bounds(60, 20);

        double mantissa = bounds.RealSpan / Math.Pow(10, Math.Floor(Math.Log10(bounds.RealSpan)));
        Assert.Contains([1.0, 1.2, 1.5, 2.0, 2.5, 3.0, 4.0, 5.0, 6.0, 8.0], m => Math.Abs(m - mantissa) < Tol);
        Assert.Equal(0.0, view.Centre.Imaginary, Tol);
        Assert.Equal(view.UnitsPerColumn * 2, view.UnitsPerRow, Tol);
    }

    [Fact]
    public void Fit_of_nothing_shows_the_origin_with_a_unit_scale()
    {
        PlaneRect bounds = PlaneView.Fit([], 40, 20).Bounds(40, 20);

        Assert.True(bounds.Contains(Complex.Zero));
        Assert.InRange(bounds.ImaginarySpan, 2.0, 5.0);
    }

    [Fact]
    public void Fit_ignores_points_at_infinity()
    {
        Complex[] points = [new(-1, 0), new(double.NegativeInfinity, 0), new(double.NaN, 1)];

        PlaneRect bounds = PlaneView.Fit(points, 40, 20).Bounds(40, 20);

        Assert.True(double.IsFinite(bounds.RealSpan));
        Assert.InRange(bounds.RealSpan, 1.0, 10.0);
    }

    [Fact]
    public void Fit_always_keeps_points_inside_with_a_margin()
    {
        Gen.Select(Gen.Double[-1e3, 1e3].Array[1, 30], Gen.Int[10, 200], Gen.Int[4, 60]).Sample((reals, columns, rows) =>
        {
            Complex[] points = reals.Select((r, i) => new Complex(r, reals[(i + 1) % reals.Length] / 3)).ToArray();
            PlaneRect b = PlaneView.Fit(points, columns, rows).Bounds(columns, rows);
            double marginRe = 0.02 * b.RealSpan;
            double marginIm = 0.02 * b.ImaginarySpan;
            return points.All(p =>
                p.Real >= b.MinReal + marginRe && p.Real <= b.MaxReal - marginRe
                && p.Imaginary >= b.MinImaginary + marginIm && p.Imaginary <= b.MaxImaginary - marginIm)
                && b.Contains(Complex.Zero);
        });
    }

    [Fact]
    public void The_scene_fits_its_circles_but_not_its_rays()
    {
        var scene = new PlaneScene
        {
            OpenLoopPoles = [new Complex(0.5, 0)],
            Boundaries = [ZPlaneBoundaries.UnitCircle(), SPlaneBoundaries.Damping(0.5, 1000)],
        };

        PlaneRect bounds = PlaneView.Fit(scene.PointsToFit(), 60, 20).Bounds(60, 20);

        Assert.True(bounds.Contains(new Complex(-1, 0)) && bounds.Contains(new Complex(0, 1)), $"{bounds}");
        Assert.True(bounds.RealSpan < 20, $"{bounds}");
    }
}
