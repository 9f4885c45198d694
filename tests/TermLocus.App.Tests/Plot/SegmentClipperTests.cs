using System.Numerics;
using TermLocus.App.Plot;

namespace TermLocus.App.Tests.Plot;

// Liang–Barsky clipping (Liang & Barsky, ACM Transactions on Graphics 3(1), 1984; from memory). Expected end points
// are worked by hand from the line equation of each segment.
public class SegmentClipperTests
{
    private const double Tol = 1e-12;
    private static readonly PlaneRect Box = new(-2, 2, -1, 1);

    [Fact]
    public void A_segment_inside_is_unchanged()
    {
        Assert.True(SegmentClipper.TryClip(new(-1, 0), new(1, 0.5), Box, out Complex a, out Complex b));
        AssertClose(new Complex(-1, 0), a);
        AssertClose(new Complex(1, 0.5), b);
    }

    [Fact]
    public void A_segment_leaving_through_the_right_edge_ends_on_it()
    {
        // y = x/2 from (0,0) to (10,5): meets x = 2 at y = 1 exactly (the top-right corner).
        Assert.True(SegmentClipper.TryClip(new(0, 0), new(10, 5), Box, out Complex a, out Complex b));
        AssertClose(Complex.Zero, a);
        AssertClose(new Complex(2, 1), b);
    }

    [Fact]
    public void A_segment_crossing_the_box_is_cut_at_both_ends_in_its_own_direction()
    {
        // From (-10, 0.5) to (10, -0.5): y = -x/20, enters at x = -2 (y = 0.1), leaves at x = 2 (y = -0.1).
        Assert.True(SegmentClipper.TryClip(new(-10, 0.5), new(10, -0.5), Box, out Complex a, out Complex b));
        AssertClose(new Complex(-2, 0.1), a);
        AssertClose(new Complex(2, -0.1), b);
    }

    [Fact]
    public void A_steep_segment_is_cut_at_top_and_bottom()
    {
        // The vertical line x = 0.5 from y = -100 to y = 100 keeps only -1 <= y <= 1.
        Assert.True(SegmentClipper.TryClip(new(0.5, -100), new(0.5, 100), Box, out Complex a, out Complex b));
        AssertClose(new Complex(0.5, -1), a);
        AssertClose(new Complex(0.5, 1), b);
    }

    [Theory]
    [InlineData(-10.0, 5.0, 10.0, 5.0)]   // above, parallel to the top edge
    [InlineData(3.0, -5.0, 3.0, 5.0)]     // right of the box, vertical
    [InlineData(1.0, 3.0, 4.0, 0.0)]      // cuts the corner region outside: x + y = 4 misses (2, 1)
    public void A_segment_outside_is_rejected(double x0, double y0, double x1, double y1) =>
        Assert.False(SegmentClipper.TryClip(new(x0, y0), new(x1, y1), Box, out _, out _));

    [Fact]
    public void Non_finite_ends_are_rejected()
    {
        Assert.False(SegmentClipper.TryClip(new(double.NaN, 0), new(1, 0), Box, out _, out _));
        Assert.False(SegmentClipper.TryClip(new(0, 0), new(double.PositiveInfinity, 0), Box, out _, out _));
    }

    private static void AssertClose(Complex expected, Complex actual)
    {
        Assert.Equal(expected.Real, actual.Real, Tol);
        Assert.Equal(expected.Imaginary, actual.Imaginary, Tol);
    }
}
