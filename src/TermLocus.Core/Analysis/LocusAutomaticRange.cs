using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>The upper end of an automatic sweep range [0, b] for a parameter that has no range of its own.</summary>
internal static class LocusAutomaticRange
{
    /// <summary>The range reaches at least this many times the largest crossing or break-point value.</summary>
    internal const double FeatureMargin = 2.0;

    /// <summary>When the loop has no asymptotes (n &lt;= m), how many gain units to go (poles then sit within about
    /// 1 % of the spread from the zeros they approach).</summary>
    private const double ApproachUnits = 100.0;

    /// <summary>Crossings and break points beyond this many times the far-pole gain are ignored: they come from
    /// poles and zeros that nearly cancel (or a zero at the origin up to rounding) and would stretch the range over
    /// dozens of decades for a feature nobody can use.</summary>
    private const double FeatureReach = 1e6;

    /// <summary>Doubling search bounds for families that are not affine: p from 2^-30 to 2^60.</summary>
    private const int LowestExponent = -30;
    private const int HighestExponent = 60;

    /// <summary>Used when a non-affine family's poles never spread out: the range stops at this value.</summary>
    private const double FallbackUpper = 1000.0;

    internal static double UpperBound(CharacteristicFamily family, double farFactor) =>
        family.Affine is { } split && !split.B.IsZero ? Affine(split, farFactor) : Scanned(family, farFactor);

    private static double Affine(AffineSplit split, double farFactor)
    {
        int n = split.A.Degree, m = split.B.Degree;
        var points = LocusFactsPoints(split);
        double spread = Spread(points);
        double unit = Math.Abs(split.A.Leading / split.B.Leading) * Math.Pow(spread, n - m);
        // Far poles obey |s − centroid|^(n−m) ≈ |p·lead(B)/lead(A)|, so this p puts them farFactor spreads out.
        double far = n > m ? unit * Math.Pow(farFactor, n - m) : ApproachUnits * unit;
        double features = AxisCrossingFinder.Solutions(split).Select(c => c.Value)
            .Concat(BreakPointFinder.Find(split, 0.0, double.MaxValue).Select(b => b.Value))
            .Where(v => v > 0.0 && v <= FeatureReach * far)
            .DefaultIfEmpty(0.0)
            .Max();
        double upper = Math.Max(far, FeatureMargin * features);
        return upper > 0.0 && double.IsFinite(upper) ? upper : FallbackUpper;
    }

    private static List<Complex> LocusFactsPoints(AffineSplit split)
    {
        var points = new List<Complex>();
        if (split.A.Degree >= 1)
        {
            points.AddRange(PolynomialRoots.Find(split.A));
        }

        if (split.B.Degree >= 1)
        {
            points.AddRange(PolynomialRoots.Find(split.B));
        }

        return points;
    }

    /// <summary>Largest distance of the points from their mean, but at least half their largest magnitude (the view
    /// holds the origin too); 1 rad/s when all sit within <see cref="TraceScale.OriginRadius"/> of the origin.</summary>
    private static double Spread(IReadOnlyList<Complex> points)
    {
        if (points.Count == 0)
        {
            return 1.0;
        }

        var mean = points.Aggregate(Complex.Zero, (a, b) => a + b) / points.Count;
        double spread = Math.Max(points.Max(z => Complex.Abs(z - mean)), 0.5 * points.Max(z => z.Magnitude));
        return spread > TraceScale.OriginRadius ? spread : 1.0;
    }

    /// <summary>Doubles p until the poles are farFactor times their spread at p = 0 away from their mean there, then
    /// extends past the last numerically found axis crossing.</summary>
    private static double Scanned(CharacteristicFamily family, double farFactor)
    {
        var start = family.At(0.0);
        var points = start.Degree >= 1 ? PolynomialRoots.Find(start).ToList() : [];
        var mean = points.Count > 0 ? points.Aggregate(Complex.Zero, (a, b) => a + b) / points.Count : Complex.Zero;
        double reach = farFactor * Spread(points);
        double far = FallbackUpper;
        for (int k = LowestExponent; k <= HighestExponent; k++)
        {
            double p = Math.ScaleB(1.0, k);
            var poly = family.At(p);
            if (poly.Degree >= 1 && PolynomialRoots.Find(poly).Any(z => Complex.Abs(z - mean) > reach))
            {
                far = p;
                break;
            }
        }

        var facts = LocusFacts.Compute(family, 0.0, far);
        double last = facts.AxisCrossings.Select(c => c.Value).DefaultIfEmpty(0.0).Max();
        return Math.Max(far, FeatureMargin * last);
    }
}
