using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Swept values where one point's feasibility can change: its spec boundaries and its stability crossings (and
/// values where a pole passes through infinity). The feasible set of the whole band can only change at the union of
/// these, so they serve as bracketing hints beside the uniform grid and keep narrow intervals from being missed.
/// The hints are the locus engine's own solved values: exact equations for affine continuous families, refined
/// crossings of a trace otherwise, grid-bracketed and bisected in the z-plane.
/// </summary>
internal static class DesignHints
{
    /// <summary>
    /// The hints of <paramref name="family"/> strictly inside <paramref name="span"/>. Best effort: when the locus
    /// engine cannot follow the family (it cannot be formed somewhere, a root iteration fails), no hints are given and
    /// the grid alone brackets that point's changes.
    /// </summary>
    public static IEnumerable<double> For(CharacteristicFamily family, LoopPlane plane, Interval span, Specs specs)
    {
        try
        {
            var values = plane.IsSampled ? Sampled(family, plane, span, specs) : Continuous(family, span, specs);
            return values.Where(v => v > span.Low && v < span.High).ToList();
        }
        catch (Exception e) when (e is PlantFileException or ArithmeticException or ArgumentException)
        {
            return [];
        }
    }

    private static IEnumerable<double> Continuous(CharacteristicFamily family, Interval span, Specs specs)
    {
        var (zeta, decay) = Limits(specs);
        bool anyLimit = zeta is not null || decay is not null || specs.MinNaturalFrequency is not null
            || specs.MaxNaturalFrequency is not null;
        var values = new List<double>(TraceDegreeDrops.Find(family, span.Low, span.High).Values);
        LocusTrace? trace = anyLimit || family.Affine is null ? LocusTracer.Trace(family, span.Low, span.High) : null;
        if (family.Affine is { } split)
        {
            values.AddRange(AxisCrossingFinder.Solutions(split).Select(s => s.Value));
        }
        else
        {
            values.AddRange(TraceCrossingFinder.Find(family, trace!, s => -s.Real).Select(c => c.Value));
            values.AddRange(TraceCrossingFinder.FindTouches(family, trace!, s => -s.Real));
        }

        if (anyLimit)
        {
            values.AddRange(SpecBoundaries.Find(family, trace!, zeta, decay, specs.MinNaturalFrequency, specs.MaxNaturalFrequency)
                .Select(b => b.Value));
        }

        return values;
    }

    private static IEnumerable<double> Sampled(CharacteristicFamily family, LoopPlane plane, Interval span, Specs specs)
    {
        var (zeta, decay) = Limits(specs);
        var values = new List<double>();
        foreach (var i in UnitCircleStability.StableIntervals(family, span.Low, span.High))
        {
            values.Add(i.From);
            values.Add(i.To);
        }

        values.AddRange(SampledSpecBoundaries.Find(family, plane, span.Low, span.High, zeta, decay,
            specs.MinNaturalFrequency, specs.MaxNaturalFrequency).Select(b => b.Value));
        return values;
    }

    // As the locus study draws them: ζ kept inside the boundary finder's range, the strictest decay-type limit.
    private static (double? Zeta, double? Decay) Limits(Specs specs) =>
        (specs.MinDamping is double z ? Math.Clamp(z, -1 + 1e-12, 1) : null, SpecCheck.RequiredDecayRate(specs));
}
