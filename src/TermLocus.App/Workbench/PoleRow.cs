using System.Numerics;
using TermLocus.Core.Analysis;

namespace TermLocus.App.Workbench;

/// <summary>One row of the pole table: a real pole, or a conjugate pair shown by its upper member.</summary>
/// <param name="Pole">The pole (for a pair, the one with positive imaginary part).</param>
/// <param name="IsPair">True for a conjugate pair.</param>
/// <param name="Metrics">ζ, ωn, σ, times and ωd of the pole.</param>
public sealed record PoleRow(Complex Pole, bool IsPair, PoleMetrics Metrics);
