using System.Numerics;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Time;

/// <summary>
/// The z-plane of a sampled loop with sample time T: the map z = e^{sT} between the planes, the stability test
/// |z| &lt; 1, and the spec contours mapped into the z-plane as polylines for drawing.
/// <para>Aliasing: z = e^{sT} is periodic in Im(s) with period 2π/T, so only the strip |Im s| ≤ π/T (the Nyquist
/// band) maps one to one. <see cref="ToS"/> returns that strip's point (the principal logarithm). A z-plane pole on
/// the negative real axis is a single real pole, yet its s equivalents form the pair ln|z|/T ± jπ/T; the upper one
/// (+π/T, oscillation at exactly the Nyquist frequency) is returned.</para>
/// </summary>
public static class ZPlane
{
    /// <summary>
    /// s = ln(z)/T on the principal branch (Im s in (−π/T, π/T]) for T = <paramref name="sampleTimeSeconds"/>
    /// (finite, &gt; 0). z = 0 (a deadbeat pole) has no finite equivalent and gives a real part of −∞.
    /// Throws <see cref="ArgumentOutOfRangeException"/> for a bad sample time.
    /// </summary>
    public static Complex ToS(Complex z, double sampleTimeSeconds)
    {
        CheckSampleTime(sampleTimeSeconds);

        // −0 imaginary parts would put negative real z on the −π side of the branch cut.
        var onBranch = z.Imaginary == 0.0 ? new Complex(z.Real, 0.0) : z;
        return Complex.Log(onBranch) / sampleTimeSeconds;
    }

    /// <summary>The z-plane point e^{sT} of an s-plane point (T in seconds, finite, &gt; 0).</summary>
    public static Complex FromS(Complex s, double sampleTimeSeconds)
    {
        CheckSampleTime(sampleTimeSeconds);
        return Complex.Exp(s * sampleTimeSeconds);
    }

    /// <summary>True when <paramref name="z"/> lies strictly inside the unit circle (a decaying sampled mode).</summary>
    public static bool IsStable(Complex z) => Complex.Abs(z) < 1.0;

    /// <summary>
    /// The s-plane figures (ζ, ωn, σ, ...) of the z-plane pole <paramref name="z"/>, through <see cref="ToS"/>;
    /// null for z = 0, which has no finite s equivalent.
    /// </summary>
    public static PoleMetrics? MetricsOf(Complex z, double sampleTimeSeconds)
    {
        var s = ToS(z, sampleTimeSeconds);
        return double.IsFinite(s.Real) && double.IsFinite(s.Imaginary) ? PoleMetrics.Of(s) : null;
    }

    /// <summary>
    /// The unit circle (the stability boundary) as a closed polyline of <paramref name="points"/> (&gt;= 4) points,
    /// counter-clockwise from z = 1; the last point repeats the first.
    /// </summary>
    public static Complex[] UnitCircle(int points = 181) => Circle(1.0, points);

    /// <summary>
    /// The image of the decay-rate line Re s = −σ: the circle |z| = e^{−σT}, as <see cref="UnitCircle"/> does it.
    /// σ in 1/s, finite (negative values give a circle outside the unit circle); T finite, &gt; 0.
    /// </summary>
    public static Complex[] DecayRateContour(double decayRate, double sampleTimeSeconds, int points = 181)
    {
        CheckSampleTime(sampleTimeSeconds);
        if (!double.IsFinite(decayRate))
        {
            throw new ArgumentOutOfRangeException(nameof(decayRate), decayRate, "Decay rate must be finite.");
        }

        return Circle(Math.Exp(-decayRate * sampleTimeSeconds), points);
    }

    /// <summary>
    /// The image of the constant-damping rays s = ωn(−ζ ± j√(1−ζ²)) for ζ = <paramref name="damping"/> in [0, 1],
    /// over the Nyquist band ωd·T in [0, π]: the logarithmic spiral z = e^{−θζ/√(1−ζ²)}·e^{jθ}. It does not depend
    /// on T. Returned as a closed polyline from z = 1 through the upper half (<paramref name="pointsPerHalf"/>
    /// points, &gt;= 2, ending on the negative real axis) and back through the lower half to z = 1. ζ = 0 gives the
    /// unit circle; ζ = 1 gives the segment from 1 to 0 on the real axis (<paramref name="pointsPerHalf"/> points).
    /// Poles inside the closed curve have more damping than ζ.
    /// </summary>
    public static Complex[] DampingContour(double damping, int pointsPerHalf = 91)
    {
        if (!(damping >= 0.0 && damping <= 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(damping), damping, "Damping ratio must be in [0, 1].");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(pointsPerHalf, 2);
        if (damping == 1.0)
        {
            return Enumerable.Range(0, pointsPerHalf).Select(k => new Complex(1.0 - ((double)k / (pointsPerHalf - 1)), 0.0)).ToArray();
        }

        double slope = damping / Math.Sqrt(1.0 - (damping * damping));
        return Mirrored(pointsPerHalf, fraction =>
        {
            double theta = Math.PI * fraction;
            return Complex.FromPolarCoordinates(Math.Exp(-slope * theta), theta);
        });
    }

    /// <summary>
    /// The image of the natural-frequency semicircle |s| = ωn in the left half-plane, s = ωn·e^{jφ} for φ from
    /// π/2 to π and its mirror, for ωn = <paramref name="naturalFrequency"/> (rad/s, finite, &gt;= 0) and T in
    /// seconds: a polyline from e^{jωnT} on the unit circle through e^{−ωnT} on the real axis to e^{−jωnT},
    /// 2·<paramref name="pointsPerHalf"/> − 1 points. Meaningful for ωn·T ≤ π; beyond, the upper and lower parts
    /// cross each other, because frequencies above π/T alias.
    /// </summary>
    public static Complex[] NaturalFrequencyContour(double naturalFrequency, double sampleTimeSeconds, int pointsPerHalf = 91)
    {
        CheckSampleTime(sampleTimeSeconds);
        if (!(naturalFrequency >= 0.0 && double.IsFinite(naturalFrequency)))
        {
            throw new ArgumentOutOfRangeException(nameof(naturalFrequency), naturalFrequency, "Must be finite, >= 0.");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(pointsPerHalf, 2);
        double reach = naturalFrequency * sampleTimeSeconds;
        var upper = Enumerable.Range(0, pointsPerHalf)
            .Select(k => Complex.Exp(Complex.FromPolarCoordinates(reach, Math.PI * (0.5 + (0.5 * k / (pointsPerHalf - 1))))))
            .ToArray();
        return upper.Concat(upper.Reverse().Skip(1).Select(Complex.Conjugate)).ToArray();
    }

    private static Complex[] Circle(double radius, int points)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(points, 4);
        var circle = new Complex[points];
        for (int k = 0; k < points; k++)
        {
            circle[k] = Complex.FromPolarCoordinates(radius, 2.0 * Math.PI * k / (points - 1));
        }

        circle[^1] = circle[0];
        return circle;
    }

    // Upper half from `at(0)` to `at(1)`, then the conjugates back: a closed curve symmetric about the real axis.
    private static Complex[] Mirrored(int pointsPerHalf, Func<double, Complex> at)
    {
        var upper = Enumerable.Range(0, pointsPerHalf).Select(k => at((double)k / (pointsPerHalf - 1))).ToArray();
        upper[^1] = new Complex(upper[^1].Real, 0.0);
        return upper.Concat(upper.Reverse().Skip(1).Select(Complex.Conjugate)).ToArray();
    }

    private static void CheckSampleTime(double sampleTimeSeconds)
    {
        if (!(double.IsFinite(sampleTimeSeconds) && sampleTimeSeconds > 0.0))
        {
            throw new ArgumentOutOfRangeException(
                nameof(sampleTimeSeconds), sampleTimeSeconds, "Sample time must be a finite number of seconds above 0.");
        }
    }
}
