using System.Collections.Immutable;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>Everything the locus shows for one loop over one span: the trace, the construction facts and the spec boundaries.</summary>
/// <param name="Span">The swept span analysed.</param>
/// <param name="Plane">The plane the roots live in (s, or z for a sampled loop).</param>
/// <param name="Trace">The traced branches (in the loop's own plane).</param>
/// <param name="Facts">Construction facts. In the z-plane the rules for asymptotes, break points and angles hold as
/// in s; stability there is the unit circle, so <see cref="LocusFacts.AxisCrossings"/> is empty and
/// <see cref="LocusFacts.StableIntervals"/> holds the unit-circle intervals.</param>
/// <param name="SpecBoundaries">Swept values where a pole crosses a spec limit (judged on equivalent s), ascending.</param>
/// <param name="UnitCircleCrossings">For a sampled loop, the swept values where a root crosses the unit circle.</param>
public sealed record LocusStudy(
    Interval Span,
    LoopPlane Plane,
    LocusTrace Trace,
    LocusFacts Facts,
    ImmutableArray<SpecBoundary> SpecBoundaries,
    ImmutableArray<UnitCircleCrossing> UnitCircleCrossings)
{
    /// <summary>
    /// Traces <paramref name="family"/> over <paramref name="span"/> and finds its facts and the boundaries of
    /// <paramref name="specs"/>' pole limits (the decay limit is the strictest of the three decay-type limits).
    /// Throws <see cref="ArgumentException"/> for an empty or non-finite span.
    /// </summary>
    public static LocusStudy Run(CharacteristicFamily family, LoopPlane plane, Interval span, Specs specs, TraceOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(specs);
        ArgumentNullException.ThrowIfNull(plane);
        var trace = LocusTracer.Trace(family, span.Low, span.High, options);
        var facts = LocusFacts.Compute(family, span.Low, span.High, options);
        double? zeta = specs.MinDamping is double z ? Math.Clamp(z, -1 + 1e-12, 1) : null;
        double? decay = SpecCheck.RequiredDecayRate(specs);
        if (!plane.IsSampled)
        {
            var boundaries = Analysis.SpecBoundaries.Find(
                family, trace, zeta, decay, specs.MinNaturalFrequency, specs.MaxNaturalFrequency);
            return new LocusStudy(span, plane, trace, facts, boundaries, []);
        }

        double t = plane.SampleTimeSeconds!.Value;
        var crossings = UnitCircleStability.Crossings(family, span.Low, span.High)
            .Select(c => new UnitCircleCrossing(c.Value, c.AngleRadians, c.AngleRadians / t)).ToImmutableArray();
        var sampledFacts = facts with
        {
            AxisCrossings = [],
            StableIntervals = UnitCircleStability.StableIntervals(family, span.Low, span.High),
        };
        var sampledBoundaries = SampledSpecBoundaries.Find(
            family, plane, span.Low, span.High, zeta, decay, specs.MinNaturalFrequency, specs.MaxNaturalFrequency);
        return new LocusStudy(span, plane, trace, sampledFacts, sampledBoundaries, crossings);
    }
}
