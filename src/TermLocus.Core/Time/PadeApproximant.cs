using TermLocus.Core.Algebra;

namespace TermLocus.Core.Time;

/// <summary>
/// Diagonal [n/n] Padé approximants of a transport delay e^{−sT}: N(s)/D(s) with
/// D(s) = Σₖ cₖ (sT)^k, N(s) = D(−s), cₖ = (2n−k)!·n! / ((2n)!·k!·(n−k)!) (the classical closed form for the
/// exponential; G. A. Baker and P. Graves-Morris, Padé Approximants, 2nd ed., ch. 1, from memory).
/// The approximant is all-pass (magnitude exactly 1 on the imaginary axis), its poles lie in the left half-plane
/// and its zeros mirror them, so it adds n poles and n right-half-plane zeros to a loop. Only the phase is
/// approximated; the phase error at ωT = x is about (n!)²/((2n)!·(2n+1)!)·x^{2n+1} rad for small x.
/// </summary>
public static class PadeApproximant
{
    /// <summary>
    /// The default order, 3. Its phase error (approximant minus true delay, measured in the unit tests) is below
    /// 1e-5 rad (0.0006°) up to ω = 1/T, 0.06° at 2/T, 0.86° at 3/T and 4.7° at 4/T; the approximant always lags
    /// slightly less than the delay. Order 3 keeps the locus to three extra poles while covering the frequencies
    /// where a delay usually limits a loop (crossover well below 1/T).
    /// </summary>
    public const int DefaultOrder = 3;

    /// <summary>The highest order accepted; beyond it the coefficients span more than 1e-20 and add nothing useful.</summary>
    public const int MaximumOrder = 10;

    /// <summary>
    /// The [n/n] approximant of e^{−sT} for T = <paramref name="delaySeconds"/> (finite, &gt;= 0; T = 0 gives the
    /// constant 1) and n = <paramref name="order"/> in [1, <see cref="MaximumOrder"/>], as a rational function of
    /// s with ascending coefficients and constant terms 1. Throws <see cref="ArgumentOutOfRangeException"/> for an
    /// argument out of range.
    /// </summary>
    public static RationalFunction Delay(double delaySeconds, int order = DefaultOrder)
    {
        if (!double.IsFinite(delaySeconds) || delaySeconds < 0.0)
        {
            throw new ArgumentOutOfRangeException(
                nameof(delaySeconds), delaySeconds, "Delay must be a finite number of seconds, 0 or above.");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(order, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(order, MaximumOrder);
        var coefficients = Coefficients(order);
        var den = new double[order + 1];
        var num = new double[order + 1];
        double power = 1.0;
        for (int k = 0; k <= order; k++)
        {
            den[k] = coefficients[k] * power;
            num[k] = (k % 2 == 0 ? 1.0 : -1.0) * den[k];
            power *= delaySeconds;
        }

        return new RationalFunction(Polynomial.FromAscending(num), Polynomial.FromAscending(den));
    }

    /// <summary>
    /// cₖ = (2n−k)!·n! / ((2n)!·k!·(n−k)!) for k = 0..n (c₀ = 1), by the ratio
    /// c₍ₖ₊₁₎/cₖ = (n−k) / ((2n−k)(k+1)), which avoids large factorials.
    /// </summary>
    internal static double[] Coefficients(int order)
    {
        var c = new double[order + 1];
        c[0] = 1.0;
        for (int k = 0; k < order; k++)
        {
            c[k + 1] = c[k] * (order - k) / ((2.0 * order - k) * (k + 1));
        }

        return c;
    }
}
