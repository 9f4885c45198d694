using System.Collections.Immutable;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Hardening;

/// <summary>
/// Runs a family through everything the screen and the JSON verbs show: trace, facts, spec boundaries, and the spec
/// check and pole figures at eleven values across the range and at every degree drop; asserts each is finite.
/// </summary>
internal static class WholeChain
{
    public static readonly Specs AllLimits = new(
        MinDamping: 0.5, MinDecayRate: 0.1, MaxTimeToHalfSeconds: 2.0, MaxSettlingTimeSeconds: 10.0,
        MinNaturalFrequency: 0.5, MaxNaturalFrequency: 50.0);

    public static (LocusTrace Trace, LocusFacts Facts, ImmutableArray<SpecBoundary> Boundaries) Run(
        CharacteristicFamily family, double from, double to)
    {
        var trace = LocusTracer.Trace(family, from, to);
        FiniteResults.Check(trace);
        var facts = LocusFacts.Compute(family, from, to);
        FiniteResults.Check(facts);
        var boundaries = SpecBoundaries.Find(family, trace, AllLimits.MinDamping, AllLimits.MinDecayRate,
            AllLimits.MinNaturalFrequency, AllLimits.MaxNaturalFrequency);
        FiniteResults.Check(boundaries);
        var values = Enumerable.Range(0, 11).Select(i => from + ((to - from) * i / 10.0)).Concat(trace.DegreeDrops);
        // Where P vanishes identically PolesAt refuses by contract (ZeroPolynomialTests); every other value is checked.
        foreach (var value in values.Where(v => !family.At(v).IsZero))
        {
            var poles = LocusTracer.PolesAt(family, value);
            FiniteResults.Check(SpecCheck.Evaluate(AllLimits, poles));
            foreach (var pole in poles)
            {
                FiniteResults.Check(PoleMetrics.Of(pole));
            }
        }

        return (trace, facts, boundaries);
    }
}
