using System.Collections.Immutable;
using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Departure angles at complex open-loop poles and arrival angles at complex open-loop zeros from the angle
/// condition on p·B/A (textbook form, e.g. departure θ = 180° + Σ∠(pole − zeros) − Σ∠(pole − other poles)).
/// A point of multiplicity q gets the q directions (base + 360°·l)/q.
/// </summary>
internal static class AngleConditionFinder
{
    /// <summary>|Im| below this share of the largest pole/zero magnitude (or 1) counts as real: no angle is given.</summary>
    private const double RealTolerance = 1e-9;

    internal static ImmutableArray<AngleConditionDirection> Departures(
        AffineSplit split, IReadOnlyList<Complex> poles, IReadOnlyList<Complex> zeros, double from, double to) =>
        Directions(split, poles, zeros, from, to, departure: true);

    internal static ImmutableArray<AngleConditionDirection> Arrivals(
        AffineSplit split, IReadOnlyList<Complex> poles, IReadOnlyList<Complex> zeros, double from, double to) =>
        Directions(split, zeros, poles, from, to, departure: false);

    /// <summary>Directions at the complex points of <paramref name="own"/>; <paramref name="other"/> is the other kind.</summary>
    private static ImmutableArray<AngleConditionDirection> Directions(AffineSplit split, IReadOnlyList<Complex> own,
        IReadOnlyList<Complex> other, double from, double to, bool departure)
    {
        double size = Math.Max(1.0, own.Concat(other).Select(z => z.Magnitude).DefaultIfEmpty(0.0).Max());
        var result = ImmutableArray.CreateBuilder<AngleConditionDirection>();
        foreach (var sign in LocusAngles.SignsIn(from, to))
        {
            double rule = LocusAngles.Uses180Degrees(split, sign) ? 180.0 : 0.0;
            foreach (var (at, q) in LocusRootClusters.Group(own))
            {
                if (Math.Abs(at.Imaginary) <= RealTolerance * size)
                {
                    continue;
                }

                double ownSum = SumOfAngles(at, own, size);
                double otherSum = SumOfAngles(at, other, size);
                // Departure: −q·θ − Σ∠(other poles) + Σ∠(zeros) = rule; arrival: q·θ + Σ∠(other zeros) − Σ∠(poles) = rule.
                double baseAngle = departure ? rule + otherSum - ownSum : rule - ownSum + otherSum;
                for (int l = 0; l < q; l++)
                {
                    result.Add(new AngleConditionDirection(at, LocusAngles.Normalize((baseAngle + (360.0 * l)) / q), sign));
                }
            }
        }

        return result.ToImmutable();
    }

    /// <summary>Σ∠(at − x) over the points x not coincident with <paramref name="at"/>, degrees.</summary>
    private static double SumOfAngles(Complex at, IReadOnlyList<Complex> points, double size)
    {
        double sum = 0.0;
        foreach (var x in points)
        {
            if (Complex.Abs(at - x) > LocusRootClusters.RelativeRadius * size)
            {
                sum += (at - x).Phase * 180.0 / Math.PI;
            }
        }

        return sum;
    }
}
