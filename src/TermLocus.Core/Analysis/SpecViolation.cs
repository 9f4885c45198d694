using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>One pole outside one limit.</summary>
/// <param name="Spec">Which limit.</param>
/// <param name="Limit">The limit as written in the plant file, in the spec's unit (<see cref="SpecKindText.Unit"/>).</param>
/// <param name="Actual">
/// The pole's value of the same figure, in the same unit; null when the pole has no finite value of it: time to half
/// and settling time of a pole with σ &lt;= 0, damping of a pole at the origin.
/// </param>
/// <param name="Margin">
/// Signed distance from the limit in the spec's unit, positive inside the spec (so negative here); minus infinity for
/// a time limit on a pole with σ &lt;= 0. See <see cref="SpecCheck"/> for each definition.
/// </param>
/// <param name="Pole">The pole (rad/s).</param>
public sealed record SpecViolation(SpecKind Spec, double Limit, double? Actual, double Margin, Complex Pole)
{
    /// <summary>The plant-file key of <see cref="Spec"/>, e.g. <c>min_damping</c>.</summary>
    public string Key => Spec.Key();
}
