using System.Collections.Immutable;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>Everything the locus shows for one loop over one span: the trace, the construction facts and the spec boundaries.</summary>
/// <param name="Span">The swept span analysed.</param>
/// <param name="Trace">The traced branches.</param>
/// <param name="Facts">Construction facts (the affine-only ones empty when not affine).</param>
/// <param name="SpecBoundaries">Swept values where a pole crosses a spec limit, ascending.</param>
public sealed record LocusStudy(Interval Span, LocusTrace Trace, LocusFacts Facts, ImmutableArray<SpecBoundary> SpecBoundaries)
{
    /// <summary>
    /// Traces <paramref name="family"/> over <paramref name="span"/> and finds its facts and the boundaries of
    /// <paramref name="specs"/>' pole limits (the decay limit is the strictest of the three decay-type limits).
    /// Throws <see cref="ArgumentException"/> for an empty or non-finite span.
    /// </summary>
    public static LocusStudy Run(CharacteristicFamily family, Interval span, Specs specs, TraceOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(specs);
        var trace = LocusTracer.Trace(family, span.Low, span.High, options);
        var facts = LocusFacts.Compute(family, span.Low, span.High, options);
        double? zeta = specs.MinDamping is double z ? Math.Clamp(z, -1 + 1e-12, 1) : null;
        var boundaries = Analysis.SpecBoundaries.Find(
            family, trace, zeta, SpecCheck.RequiredDecayRate(specs), specs.MinNaturalFrequency, specs.MaxNaturalFrequency);
        return new LocusStudy(span, trace, facts, boundaries);
    }
}
