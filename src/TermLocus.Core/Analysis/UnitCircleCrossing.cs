namespace TermLocus.Core.Analysis;

/// <summary>A root of a sampled loop crossing the unit circle as the swept value passes <paramref name="Value"/>.</summary>
/// <param name="Value">The swept value there.</param>
/// <param name="AngleRadians">The crossing root's angle ωT in [0, π] (0 at z = 1, π at z = -1).</param>
/// <param name="EquivalentFrequency">ω = angle / T in rad/s, comparable with an s-plane crossing's frequency.</param>
public sealed record UnitCircleCrossing(double Value, double AngleRadians, double EquivalentFrequency);
