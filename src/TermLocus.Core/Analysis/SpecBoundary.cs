using System.Collections.Immutable;
using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>A swept value at which a closed-loop pole lies exactly on a spec limit's boundary in the s-plane.</summary>
/// <param name="Spec">Which limit.</param>
/// <param name="Limit">The limit's value (ζ dimensionless; σ in 1/s; ωn in rad/s).</param>
/// <param name="Value">The swept value p there, solved to at least 1e-9 relative (Brent's method on the exact roots).</param>
/// <param name="Pole">The pole on the boundary (the upper one of a conjugate pair), rad/s.</param>
/// <param name="PoleMeetsLimitAfter">True when that pole moves onto the allowed side as p increases past
/// <paramref name="Value"/>, false when it leaves it.</param>
/// <param name="Poles">All closed-loop poles at <paramref name="Value"/>, sorted by real then imaginary part.</param>
public sealed record SpecBoundary(
    SpecBoundaryKind Spec,
    double Limit,
    double Value,
    Complex Pole,
    bool PoleMeetsLimitAfter,
    ImmutableArray<Complex> Poles);
