using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Break points of an affine family P = A + p·B: the roots s of A'B − AB' at which p = −A(s)/B(s) is real.
/// Each root is polished by Newton's method on A'B − AB' itself, so p is exact to rounding.
/// </summary>
internal static class BreakPointFinder
{
    /// <summary>|Im p| above this share of max(|p|, gain unit) means the root is not a break point.</summary>
    private const double RealValueTolerance = 1e-6;

    /// <summary>|p| below this share of the gain unit is p = 0 (a multiple open-loop pole).</summary>
    private const double ZeroValueTolerance = 1e-12;

    /// <summary>Relative step in |p| used to see how the branches move on either side of a break point.</summary>
    private const double ProbeStep = 1e-6;

    internal static ImmutableArray<BreakPoint> Find(AffineSplit split, double from, double to)
    {
        var d = (split.A.Derivative() * split.B) - (split.A * split.B.Derivative());
        if (d.Degree < 1)
        {
            return [];
        }

        double unit = LocusGainUnit.Of(split);
        var roots = PolynomialRoots.Find(d);
        double size = roots.Max(r => r.Magnitude);
        var found = new List<BreakPoint>();
        foreach (var (center, multiplicity) in LocusRootClusters.Group(roots))
        {
            var start = LocusRootClusters.IsNearlyReal(center, size) ? new Complex(center.Real, 0.0) : center;
            var s = LocusNewton.Polish(d, start, multiplicity);
            if (ValueAt(split, s, unit) is not { } p || !LocusRange.Contains(from, to, p))
            {
                continue;
            }

            found.Add(new BreakPoint(s, p, Classify(split, s, p, multiplicity + 1), multiplicity + 1));
        }

        return [.. found.OrderBy(b => b.Value).ThenBy(b => b.Location.Real).ThenBy(b => b.Location.Imaginary)];
    }

    /// <summary>p = −A(s)/B(s) when it is finite and real, else null.</summary>
    private static double? ValueAt(AffineSplit split, Complex s, double unit)
    {
        var b = split.B.Evaluate(s);
        if (b.Magnitude <= LocusMagnitude.RoundingBound(split.B, s))
        {
            return null;
        }

        var p = -split.A.Evaluate(s) / b;
        if (Math.Abs(p.Imaginary) > RealValueTolerance * Math.Max(Math.Abs(p.Real), unit))
        {
            return null;
        }

        return Math.Abs(p.Real) <= ZeroValueTolerance * unit ? 0.0 : p.Real;
    }

    /// <summary>Compares how many of the meeting poles are real just before and just after, in |p|.</summary>
    private static BreakPointKind Classify(AffineSplit split, Complex s, double p, int meeting)
    {
        if (p == 0.0)
        {
            return BreakPointKind.Breakaway;
        }

        int before = RealPolesNear(split.At(p * (1.0 - ProbeStep)), s, meeting);
        int after = RealPolesNear(split.At(p * (1.0 + ProbeStep)), s, meeting);
        return after > before ? BreakPointKind.BreakIn : BreakPointKind.Breakaway;
    }

    private static int RealPolesNear(Polynomial poly, Complex s, int count)
    {
        var near = PolynomialRoots.Find(poly).OrderBy(r => Complex.Abs(r - s)).Take(count).ToArray();
        double spread = 0.0;
        foreach (var a in near)
        {
            foreach (var b in near)
            {
                spread = Math.Max(spread, Complex.Abs(a - b));
            }
        }

        // A complex pair's imaginary parts are half its spread; a real pair's are rounding noise.
        return near.Count(r => Math.Abs(r.Imaginary) <= 0.01 * spread);
    }
}
