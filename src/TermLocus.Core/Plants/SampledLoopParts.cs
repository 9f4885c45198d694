using TermLocus.Core.Algebra;

namespace TermLocus.Core.Plants;

/// <summary>The parts of a sampled loop at given values, as the hybrid simulation needs them.</summary>
/// <param name="Controller">C(z), rational in z (1 when the file gives none).</param>
/// <param name="Plant">G(s), rational in s.</param>
/// <param name="Sensor">H(s), rational in s (1 when the file gives none).</param>
/// <param name="HeldDenominator">The denominator of (G·H)_τ(z), the factor of the loop gain after C(z).</param>
internal sealed record SampledLoopParts(RationalFunction Controller, RationalFunction Plant, RationalFunction Sensor, Polynomial HeldDenominator);
