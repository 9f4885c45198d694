using System.Numerics;
using TermLocus.Core.Expressions;
using TermLocus.Core.Time;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The plane a loop's characteristic polynomial is written in: the s-plane of a continuous loop, or the z-plane of
/// a loop sampled every T seconds behind a zero-order hold. Every figure of a pole (ζ, ωn, σ, time to half) is
/// computed from its equivalent s-plane point (<see cref="ToEquivalentS"/>), so <see cref="PoleMetrics"/> and
/// spec checks work unchanged in either plane.
/// <para>Aliasing: z = e^{sT} repeats every 2π/T in Im(s), so a z-plane pole stands for a whole column of s points;
/// the one in the band |Im s| ≤ π/T (the principal logarithm) is used. A sampled mode that truly oscillates faster
/// than π/T rad/s (half the sampling frequency) is reported at its alias, with a smaller ωn and a different ζ; a
/// pole on the negative real z axis is reported as oscillating at exactly π/T. Specs near or above π/T rad/s cannot
/// be judged from sampled poles: sample faster.</para>
/// </summary>
public sealed record LoopPlane
{
    private LoopPlane(PlaneKind kind, double? sampleTimeSeconds)
    {
        Kind = kind;
        SampleTimeSeconds = sampleTimeSeconds;
    }

    /// <summary>The s-plane of a continuous loop.</summary>
    public static LoopPlane Continuous { get; } = new(PlaneKind.S, null);

    /// <summary>S or Z.</summary>
    public PlaneKind Kind { get; }

    /// <summary>The sample time T in seconds (finite, &gt; 0) in the z-plane; null in the s-plane.</summary>
    public double? SampleTimeSeconds { get; }

    /// <summary>True in the z-plane.</summary>
    public bool IsSampled => Kind == PlaneKind.Z;

    /// <summary>The name of the polynomials' variable: <c>s</c> or <c>z</c>.</summary>
    public string VariableName => IsSampled ? ExpressionNames.ShiftVariable : ExpressionNames.LaplaceVariable;

    /// <summary>π/T in rad/s, the highest frequency a sampled pole can show without aliasing; null in the s-plane.</summary>
    public double? NyquistFrequency => SampleTimeSeconds is double t ? Math.PI / t : null;

    /// <summary>The z-plane of a loop sampled every <paramref name="sampleTimeSeconds"/> (finite, &gt; 0).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The sample time is not finite or not above 0.</exception>
    public static LoopPlane Sampled(double sampleTimeSeconds)
    {
        if (!(double.IsFinite(sampleTimeSeconds) && sampleTimeSeconds > 0.0))
        {
            throw new ArgumentOutOfRangeException(
                nameof(sampleTimeSeconds), sampleTimeSeconds, "Sample time must be a finite number of seconds above 0.");
        }

        return new LoopPlane(PlaneKind.Z, sampleTimeSeconds);
    }

    /// <summary>
    /// The s-plane point a root stands for: the root itself in the s-plane; s = ln(z)/T (principal branch,
    /// Im s in (−π/T, π/T]) in the z-plane. z = 0, a deadbeat pole, has no finite equivalent: its real part is −∞.
    /// </summary>
    public Complex ToEquivalentS(Complex root) => SampleTimeSeconds is double t ? ZPlane.ToS(root, t) : root;

    /// <summary>The root of this plane that an s-plane point maps to: s itself, or z = e^{sT}.</summary>
    public Complex FromEquivalentS(Complex s) => SampleTimeSeconds is double t ? ZPlane.FromS(s, t) : s;

    /// <summary>True when the root is a decaying mode: Re(root) &lt; 0 in the s-plane, |root| &lt; 1 in the z-plane.</summary>
    public bool IsStable(Complex root) => IsSampled ? Complex.Abs(root) < 1.0 : root.Real < 0.0;

    /// <summary>
    /// The figures of a root through its equivalent s-plane point; null when it has none that is finite (z = 0, a
    /// deadbeat pole, which decays completely in one sample).
    /// </summary>
    public PoleMetrics? MetricsOf(Complex root)
    {
        var s = ToEquivalentS(root);
        return double.IsFinite(s.Real) && double.IsFinite(s.Imaginary) ? PoleMetrics.Of(s) : null;
    }
}
