using System.Collections.Immutable;
using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>How one limit fares over the whole tolerance box: its worst point.</summary>
/// <param name="Spec">Which limit.</param>
/// <param name="Limit">The limit, in the spec's unit.</param>
/// <param name="WorstActual">The worst pole's figure there; null when it has no finite value.</param>
/// <param name="WorstMargin">The smallest margin over the box, in the spec's unit (positive inside the spec).</param>
/// <param name="WorstRelativeMargin">That margin relative to the limit (see <see cref="SpecOutcome.WorstRelativeMargin"/>).</param>
/// <param name="WorstPole">The pole with that margin.</param>
/// <param name="At">Values of the toleranced parameters where it occurs (empty when nothing is toleranced).</param>
/// <param name="AtCorner">False when the worst point lies inside the box (found by search).</param>
public sealed record BandOutcome(
    SpecKind Spec,
    double Limit,
    double? WorstActual,
    double WorstMargin,
    double WorstRelativeMargin,
    Complex WorstPole,
    ImmutableDictionary<string, double> At,
    bool AtCorner)
{
    /// <summary>The plant-file key of <see cref="Spec"/>.</summary>
    public string Key => Spec.Key();

    /// <summary>True when the limit holds everywhere in the box.</summary>
    public bool Met => WorstMargin >= 0.0;
}
