using System.Numerics;
using TermLocus.Core.Analysis;

namespace TermLocus.App.Workbench;

/// <summary>One row of the pole table: a real pole, or a conjugate pair shown by its upper member.</summary>
/// <param name="Pole">The pole as drawn (for a pair, the one with positive imaginary part), in the loop's plane.</param>
/// <param name="IsPair">True for a conjugate pair.</param>
/// <param name="Metrics">ζ, ωn, σ, times and ωd of the pole (through its equivalent s in a sampled loop); null for a
/// deadbeat root z = 0, which has no finite equivalent.</param>
/// <param name="IsStable">True when the pole decays (left half-plane, or inside the unit circle).</param>
/// <param name="OnBoundary">True when the pole lies on the stability boundary itself (on the imaginary axis, the
/// origin included, or on the unit circle): it neither decays nor grows.</param>
public sealed record PoleRow(Complex Pole, bool IsPair, PoleMetrics? Metrics, bool IsStable = true, bool OnBoundary = false);
