using System.Collections.Immutable;
using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>One point of a tolerance box: the toleranced parameters' values there and the closed-loop poles.</summary>
/// <param name="Toleranced">Values of the toleranced parameters at this point, by name (empty for a box without axes).</param>
/// <param name="Poles">Finite closed-loop poles at this point (any order).</param>
/// <param name="IsCorner">True for a corner of the box, false for an interior point found by search.</param>
public sealed record BandPoint(ImmutableDictionary<string, double> Toleranced, ImmutableArray<Complex> Poles, bool IsCorner);

/// <summary>The lowest value of an objective over a tolerance box, and where it occurs.</summary>
/// <param name="Value">The lowest objective value found.</param>
/// <param name="At">The point where it occurs.</param>
public sealed record BandMinimum(double Value, BandPoint At);
