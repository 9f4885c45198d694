using System.Diagnostics.CodeAnalysis;
using System.Globalization;
using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Time;

/// <summary>
/// The exact zero-order-hold equivalent G(z) of a continuous transfer function G(s): the map from the held input
/// samples u[k] to the output samples y(kT). Method: a balanced state-space realisation (A, B, C, D) of G(s);
/// Φ = e^{AT} and Γ = ∫₀ᵀ e^{Aτ}dτ·B from one augmented matrix exponential; then
/// G(z) = C·(zI − Φ)⁻¹·Γ + D = (C·adj(zI − Φ)·Γ + D·det(zI − Φ)) / det(zI − Φ).
/// The denominator det(zI − Φ) = Π (z − e^{pᵢT}) over the roots pᵢ of G's denominator (Φ's eigenvalues are
/// exactly those), so s-plane and z-plane poles agree one for one, common factors included. The numerator
/// P(z) = C·adj(zI − Φ)·Γ (degree below n) is interpolated from its values at n points on the circle
/// |z| = 1 + max|e^{pᵢT}|, which keeps every point at least 1 away from every pole, by a discrete Fourier
/// transform; each value is det(z − Φ)·C·(zI − Φ)⁻¹·Γ from one complex LU solve. Coefficients come out with an
/// absolute error of a few ulps times (1 + max|e^{pᵢT}|)^{n−1} relative to the largest numerator coefficient
/// (about 1e-13 for the textbook cases in the tests).
/// <para>Limit of the polynomial form: when the sample time is short beside the loop's time constants, all poles
/// crowd near z = 1 and the coefficients of a polynomial in z can no longer hold them: near z = 1 (the steady-state gain,
/// the slow modes, the step response) about 1e-16·2ⁿ/Π|pᵢT| of relative accuracy is left, whatever the method
/// (see <see cref="AccuracyEstimate"/>). Two poles at |p|T = 1e-3 keep about 10 digits, five at 1e-2 about 7,
/// eight at 1e-3 none.</para>
/// </summary>
public static class ZeroOrderHold
{
    private const double UnitRoundoff = 1.1e-16;
    private const double OriginTolerance = 1e-8;

    /// <summary>
    /// G(z) for the proper <paramref name="g"/> (rational in s) held over <paramref name="sampleTimeSeconds"/>
    /// (finite, &gt; 0), as a rational function of z with a monic denominator of the same degree as g's.
    /// Throws <see cref="ArgumentException"/> for an improper g or a bad sample time.
    /// </summary>
    public static RationalFunction Discretise(RationalFunction g, double sampleTimeSeconds) =>
        Discretise(g, sampleTimeSeconds, 0.0);

    /// <summary>
    /// The hold equivalent of g(s)·e^{−sτ}, a transport delay τ = <paramref name="delaySeconds"/> (finite, &gt;= 0,
    /// at most 1000 sample intervals) between the hold and g: the map from held samples u[k] to y(kT), exact.
    /// With τ = k·T + τ' (0 &lt;= τ' &lt; T) the whole part is z^{−k}; a remainder τ' &gt; 0 holds the input
    /// u[k−1] for the first τ' of each interval and u[k] for the rest, so x[k+1] = Φ·x[k] + Γ₀·u[k] + Γ₁·u[k−1] with
    /// Γ₀ = Γ(T − τ'), Γ₁ = e^{A(T−τ')}·Γ(τ') and y[k] = C·x[k] + D·u[k−1] (the modified z-transform with a hold;
    /// G. F. Franklin, J. D. Powell, M. Workman, Digital Control of Dynamic Systems, 3rd ed., §4.3.4, from memory).
    /// The denominator is det(zI − Φ)·z^{k} (times z once more for a remainder), monic; nothing is cancelled.
    /// Throws <see cref="ArgumentException"/> for an improper g, a bad sample time or a bad delay.
    /// </summary>
    public static RationalFunction Discretise(RationalFunction g, double sampleTimeSeconds, double delaySeconds) =>
        TryDiscretise(g, sampleTimeSeconds, delaySeconds, out var result, out var error)
            ? result
            : throw new ArgumentException(error);

    /// <summary>As <see cref="Discretise(RationalFunction, double)"/>, returning false with a one-line reason instead of throwing.</summary>
    public static bool TryDiscretise(
        RationalFunction g,
        double sampleTimeSeconds,
        [NotNullWhen(true)] out RationalFunction? result,
        [NotNullWhen(false)] out string? error) =>
        TryDiscretise(g, sampleTimeSeconds, 0.0, out result, out error);

    /// <summary>As <see cref="Discretise(RationalFunction, double, double)"/>, returning false with a one-line reason instead of throwing.</summary>
    public static bool TryDiscretise(
        RationalFunction g,
        double sampleTimeSeconds,
        double delaySeconds,
        [NotNullWhen(true)] out RationalFunction? result,
        [NotNullWhen(false)] out string? error)
    {
        ArgumentNullException.ThrowIfNull(g);
        result = null;
        error = CheckTimes(sampleTimeSeconds, delaySeconds, out var delay);
        if (error is not null || !StateSpace.TryFromTransferFunction(g, out var system, out error))
        {
            return false;
        }

        var shift = Polynomial.FromAscending([.. new double[delay.WholeSamples + (delay.RemainderSeconds > 0.0 ? 1 : 0)], 1.0]);
        if (system.Order == 0)
        {
            result = new RationalFunction(Polynomial.Constant(system.D), shift);
            return true;
        }

        var zPoles = PolynomialRoots.Find(g.Denominator).Select(p => Complex.Exp(p * sampleTimeSeconds)).ToArray();
        var den = Polynomial.FromRoots(zPoles);
        double radius = 1.0 + zPoles.Max(Complex.Abs);
        var hold = HoldDiscretisation.Of(system, sampleTimeSeconds);
        Polynomial num;
        if (delay.RemainderSeconds > 0.0)
        {
            var late = HoldDiscretisation.Of(system, sampleTimeSeconds - delay.RemainderSeconds);
            var gamma1 = late.Phi * HoldDiscretisation.Of(system, delay.RemainderSeconds).Gamma;
            num = HoldNumerator.Interpolate(system.C, hold.Phi, late.Gamma, gamma1, den, radius);
        }
        else
        {
            num = HoldNumerator.Interpolate(system.C, hold.Phi, hold.Gamma, null, den, radius);
        }

        result = new RationalFunction(num + (system.D * den), den * shift);
        return true;
    }

    /// <summary>
    /// An estimate of the relative accuracy left near z = 1 in G(z) = <see cref="Discretise(RationalFunction, double)"/>(g, T) by the
    /// polynomial form itself: 1.1e-16·2ⁿ / Π|pᵢT| over the poles pᵢ of g, skipping poles at the origin (below
    /// 1e-8 of the largest modulus), which z = 1 represents exactly. Measured step-response errors in the tests
    /// lie 3 to 30 times below it. Values near or above 1e-3 mean the sample time is too short for this loop's
    /// order to be handled as a ratio of polynomials in z. T in seconds, finite, &gt; 0.
    /// </summary>
    public static double AccuracyEstimate(RationalFunction g, double sampleTimeSeconds)
    {
        ArgumentNullException.ThrowIfNull(g);
        if (!double.IsFinite(sampleTimeSeconds) || sampleTimeSeconds <= 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(sampleTimeSeconds), sampleTimeSeconds, "Must be finite, > 0.");
        }

        if (g.Denominator.Degree < 1)
        {
            return UnitRoundoff;
        }

        var moduli = PolynomialRoots.Find(g.Denominator).Select(Complex.Abs).ToArray();
        double floor = OriginTolerance * moduli.Max();
        double estimate = UnitRoundoff * Math.Pow(2.0, moduli.Length);
        foreach (double m in moduli.Where(m => m > floor))
        {
            estimate /= m * sampleTimeSeconds;
        }

        return estimate;
    }

    private static string? CheckTimes(double sampleTimeSeconds, double delaySeconds, out SampleDelay delay)
    {
        delay = default;
        if (!double.IsFinite(sampleTimeSeconds) || sampleTimeSeconds <= 0.0)
        {
            return "Sample time must be a finite number of seconds above 0, got " +
                   sampleTimeSeconds.ToString("R", CultureInfo.InvariantCulture) + ".";
        }

        if (!double.IsFinite(delaySeconds) || delaySeconds < 0.0)
        {
            return "Delay must be a finite number of seconds, 0 or above, got " +
                   delaySeconds.ToString("R", CultureInfo.InvariantCulture) + ".";
        }

        return SampleDelay.TrySplit(delaySeconds, sampleTimeSeconds, out delay)
            ? null
            : $"Delay spans more than {SampleDelay.MaximumWholeSamples} sample intervals.";
    }
}
