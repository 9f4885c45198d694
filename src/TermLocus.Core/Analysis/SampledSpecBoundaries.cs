using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Spec boundaries of a sampled loop: swept values where a root, mapped to its equivalent s = ln(z)/T, crosses a
/// pole limit. The s-plane boundary finder works on lines and circles in s, which are curves in z, so here each
/// limit's margin is followed along the sweep instead (bracketed on a grid, ends bisected; see <see cref="SignIntervals"/>).
/// </summary>
public static class SampledSpecBoundaries
{
    /// <summary>Boundaries of the given limits over [from, to] for a family in z, ascending by value.</summary>
    public static ImmutableArray<SpecBoundary> Find(
        CharacteristicFamily family, LoopPlane plane, double from, double to,
        double? minDamping, double? minDecayRate, double? minNaturalFrequency, double? maxNaturalFrequency)
    {
        var found = new List<SpecBoundary>();
        Add(found, family, plane, from, to, SpecBoundaryKind.MinDamping, minDamping, m => (m.Damping ?? 1.0) - minDamping!.Value);
        Add(found, family, plane, from, to, SpecBoundaryKind.MinDecayRate, minDecayRate, m => m.DecayRate - minDecayRate!.Value);
        Add(found, family, plane, from, to, SpecBoundaryKind.MinNaturalFrequency, minNaturalFrequency, m => m.NaturalFrequency - minNaturalFrequency!.Value);
        Add(found, family, plane, from, to, SpecBoundaryKind.MaxNaturalFrequency, maxNaturalFrequency, m => maxNaturalFrequency!.Value - m.NaturalFrequency);
        return [.. found.OrderBy(b => b.Value).ThenBy(b => b.Spec)];
    }

    private static void Add(
        List<SpecBoundary> found, CharacteristicFamily family, LoopPlane plane, double from, double to,
        SpecBoundaryKind kind, double? limit, Func<PoleMetrics, double> margin)
    {
        if (limit is not double value)
        {
            return;
        }

        double Worst(double p) => WorstMargin(family, plane, p, margin).Margin;
        foreach (var (low, high) in SignIntervals.Find(Worst, from, to, UnitCircleStability.GridPoints))
        {
            foreach (var (end, meetsAfter) in new[] { (low, true), (high, false) })
            {
                if (UnitCircleStability.IsInside(end, from, to))
                {
                    var roots = PolynomialRoots.Find(family.At(end));
                    var pole = WorstMargin(family, plane, end, margin).Root;
                    found.Add(new SpecBoundary(kind, value, end, pole, meetsAfter, [.. roots]));
                }
            }
        }
    }

    private static (double Margin, Complex Root) WorstMargin(
        CharacteristicFamily family, LoopPlane plane, double p, Func<PoleMetrics, double> margin)
    {
        double worst = double.PositiveInfinity;
        Complex at = Complex.Zero;
        foreach (var z in PolynomialRoots.Find(family.At(p)))
        {
            if (plane.MetricsOf(z) is not { } metrics)
            {
                continue; // z = 0: a deadbeat mode meets every limit
            }

            double m = margin(metrics);
            if (m < worst)
            {
                (worst, at) = (m, z);
            }
        }

        return (worst, at);
    }
}
