using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>One point of a locus branch: the swept value and the closed-loop pole there.</summary>
/// <param name="Value">The swept parameter's value p (its own unit).</param>
/// <param name="Pole">The closed-loop pole s, a root of P(s; p), in rad/s.</param>
public readonly record struct LocusPoint(double Value, Complex Pole);
