using System.Numerics;

namespace TermLocus.App.Workbench;

/// <summary>One traced point of a locus branch (same shape as the locus engine's; replaced by it on merge).</summary>
/// <param name="Value">The swept value.</param>
/// <param name="Pole">The closed-loop pole there.</param>
public readonly record struct LocusPoint(double Value, Complex Pole);
