using System.Numerics;

namespace TermLocus.App.Plot;

/// <summary>
/// Liang–Barsky clipping of a straight segment of the complex plane to a <see cref="PlaneRect"/>: the part of
/// the segment inside the rectangle, so a branch that runs off towards an asymptote ends at the edge of the plot
/// instead of being drawn to a far-away clamped dot.
/// </summary>
public static class SegmentClipper
{
    /// <summary>Clips segment <paramref name="from"/>–<paramref name="to"/> to <paramref name="bounds"/>.</summary>
    /// <returns>False when no part of the segment is inside (or an end is not finite); otherwise true with the
    /// clipped ends in <paramref name="clippedFrom"/> and <paramref name="clippedTo"/>, in the original direction.</returns>
    public static bool TryClip(Complex from, Complex to, PlaneRect bounds, out Complex clippedFrom, out Complex clippedTo)
    {
        clippedFrom = from;
        clippedTo = to;
        if (!IsFinite(from) || !IsFinite(to))
        {
            return false;
        }

        double dx = to.Real - from.Real;
        double dy = to.Imaginary - from.Imaginary;
        double enter = 0.0;
        double leave = 1.0;
        bool visible =
            ClipEdge(-dx, from.Real - bounds.MinReal, ref enter, ref leave)
            && ClipEdge(dx, bounds.MaxReal - from.Real, ref enter, ref leave)
            && ClipEdge(-dy, from.Imaginary - bounds.MinImaginary, ref enter, ref leave)
            && ClipEdge(dy, bounds.MaxImaginary - from.Imaginary, ref enter, ref leave);
        if (!visible)
        {
            return false;
        }

        clippedFrom = new Complex(from.Real + (enter * dx), from.Imaginary + (enter * dy));
        clippedTo = new Complex(from.Real + (leave * dx), from.Imaginary + (leave * dy));
        return true;
    }

    /// <summary>True when both parts of <paramref name="point"/> are finite numbers.</summary>
    public static bool IsFinite(Complex point) => double.IsFinite(point.Real) && double.IsFinite(point.Imaginary);

    // One edge of Liang–Barsky: p is the direction component towards the outside, q the distance to the edge.
    private static bool ClipEdge(double p, double q, ref double enter, ref double leave)
    {
        if (p == 0)
        {
            return q >= 0;
        }

        double t = q / p;
        if (p < 0)
        {
            if (t > leave)
            {
                return false;
            }

            enter = Math.Max(enter, t);
        }
        else
        {
            if (t < enter)
            {
                return false;
            }

            leave = Math.Min(leave, t);
        }

        return true;
    }
}
