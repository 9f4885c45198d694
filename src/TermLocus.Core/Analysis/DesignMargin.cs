using System.Collections.Immutable;

namespace TermLocus.Core.Analysis;

/// <summary>The smallest margin of a checked design and where in the band it occurs.</summary>
/// <param name="Spec">The plant-file key of the limit (e.g. <c>min_damping</c>, <c>max_overshoot_pct</c>), or
/// <c>stability</c> when the file sets no limit the design judges or the loop is unstable somewhere in the band; then
/// the margin is the slowest pole's decay rate σ.</param>
/// <param name="Margin">The margin in the spec's unit (<see cref="SpecKindText.Unit"/>: percentage points for
/// overshoot; 1/s for stability), positive inside the spec.</param>
/// <param name="RelativeMargin">The margin divided by |limit| (dimensionless); for stability, the margin itself.</param>
/// <param name="At">Values of the toleranced parameters where it occurs (empty when nothing is toleranced).</param>
/// <param name="AtCorner">False when that point lies inside the box (found by the band search).</param>
public sealed record DesignMargin(
    string Spec, double Margin, double RelativeMargin, ImmutableDictionary<string, double> At, bool AtCorner)
{
    /// <summary>The key used for the stability margin.</summary>
    public const string StabilityKey = "stability";
}
