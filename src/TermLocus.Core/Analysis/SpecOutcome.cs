using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>How one limit fares over a set of poles: the pole closest to violating it, or deepest in violation.</summary>
/// <param name="Spec">Which limit.</param>
/// <param name="Limit">The limit, in the spec's unit (<see cref="SpecKindText.Unit"/>).</param>
/// <param name="WorstActual">The worst pole's value of the figure; null when it has no finite value (see <see cref="SpecViolation.Actual"/>).</param>
/// <param name="WorstMargin">The smallest margin over the poles, in the spec's unit, positive inside the spec; may be minus infinity.</param>
/// <param name="WorstRelativeMargin">
/// <paramref name="WorstMargin"/> divided by |<paramref name="Limit"/>| (dimensionless), or the margin itself when the
/// limit is 0; this is what ranks different specs against each other.
/// </param>
/// <param name="WorstPole">The pole with the smallest margin (of a conjugate pair, the upper one).</param>
public sealed record SpecOutcome(
    SpecKind Spec, double Limit, double? WorstActual, double WorstMargin, double WorstRelativeMargin, Complex WorstPole)
{
    /// <summary>The plant-file key of <see cref="Spec"/>.</summary>
    public string Key => Spec.Key();

    /// <summary>True when every pole meets the limit (margin &gt;= 0; a pole exactly on the limit meets it).</summary>
    public bool Met => WorstMargin >= 0.0;
}
