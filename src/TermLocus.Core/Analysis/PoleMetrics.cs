using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Figures of one closed-loop pole s = -σ + jωd in the s-plane.
/// Conventions: ωn = |s| (rad/s); σ = -Re(s) (1/s, positive when decaying); ζ = σ/ωn, so ζ = 1 for a stable real pole,
/// -1 for an unstable real pole, negative in the right half-plane, and null at the origin; ωd = |Im(s)| (rad/s);
/// time to half amplitude ln2/σ (s) when σ &gt; 0, time to double ln2/(-σ) when σ &lt; 0.
/// </summary>
/// <param name="Pole">The pole.</param>
/// <param name="Damping">ζ in [-1, 1], or null at the origin.</param>
/// <param name="NaturalFrequency">ωn in rad/s, &gt;= 0.</param>
/// <param name="DecayRate">σ in 1/s (negative for a growing pole).</param>
/// <param name="DampedFrequency">ωd in rad/s, &gt;= 0.</param>
/// <param name="TimeToHalfSeconds">ln2/σ for σ &gt; 0, else null.</param>
/// <param name="TimeToDoubleSeconds">ln2/(-σ) for σ &lt; 0, else null.</param>
public sealed record PoleMetrics(
    Complex Pole,
    double? Damping,
    double NaturalFrequency,
    double DecayRate,
    double DampedFrequency,
    double? TimeToHalfSeconds,
    double? TimeToDoubleSeconds)
{
    /// <summary>
    /// The 2 % settling-time estimate 4/σ = 4/(ζωn) in seconds (the envelope e^(-σt) falls below e^-4 ≈ 1.8 %)
    /// for σ &gt; 0, else null.
    /// </summary>
    public double? SettlingTime2PctSeconds => DecayRate > 0 ? 4.0 / DecayRate : null;

    /// <summary>The figures of pole <paramref name="s"/> (finite).</summary>
    public static PoleMetrics Of(Complex s)
    {
        double wn = Complex.Abs(s);
        double sigma = -s.Real;
        double? zeta = wn == 0.0 ? null : Math.Clamp(sigma / wn, -1.0, 1.0);
        return new PoleMetrics(
            s,
            zeta,
            wn,
            sigma,
            Math.Abs(s.Imaginary),
            sigma > 0 ? Math.Log(2.0) / sigma : null,
            sigma < 0 ? Math.Log(2.0) / -sigma : null);
    }
}
