using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Time;

/// <summary>
/// Step-response figures estimated from the dominant closed-loop pole pair as if the loop were the standard
/// second-order system ωn²/(s² + 2ζωn·s + ωn²) (K. Ogata, Modern Control Engineering, 5th ed., §5-3, from memory):
/// overshoot 100·exp(−ζπ/√(1−ζ²)) %, peak time π/ωd, settling time 4/(ζωn) for the 2 % band and 3/(ζωn) for 5 %.
/// The dominant pole is the one with the smallest decay rate σ = ζωn (nearest the imaginary axis); a complex pair
/// wins a tie with a real pole. When it is real the estimates are those of ζ = 1: no overshoot, no peak time,
/// settling 4/σ and 3/σ. Zeros and the other poles are ignored, which is what makes these estimates.
/// </summary>
/// <param name="Poles">The poles used: the dominant pair (upper half first) or the single real pole.</param>
/// <param name="Damping">ζ of the dominant pole, in (0, 1].</param>
/// <param name="NaturalFrequency">ωn in rad/s.</param>
/// <param name="OvershootPct">Estimated overshoot in percent of the steady state.</param>
/// <param name="PeakTimeSeconds">Estimated peak time in seconds (π/ωd plus any delay); null for a real pole.</param>
/// <param name="SettlingTime2PctSeconds">4/σ plus any delay, in seconds.</param>
/// <param name="SettlingTime5PctSeconds">3/σ plus any delay, in seconds.</param>
public sealed record SecondOrderEstimate(
    ImmutableArray<Complex> Poles,
    double Damping,
    double NaturalFrequency,
    double OvershootPct,
    double? PeakTimeSeconds,
    double SettlingTime2PctSeconds,
    double SettlingTime5PctSeconds)
{
    private const double NarrowBandDecays = 4.0;
    private const double WideBandDecays = 3.0;

    // Decay rates equal to this relative tolerance count as a tie between a real pole and a pair.
    private const double TieTolerance = 1e-9;

    /// <summary>
    /// The estimates for the closed loop <paramref name="closedLoop"/> (rational in s) from the roots of its
    /// denominator, with the response delayed by <paramref name="delaySeconds"/> (&gt;= 0). Null when the loop is
    /// not strictly stable or has no poles.
    /// </summary>
    public static SecondOrderEstimate? Of(RationalFunction closedLoop, double delaySeconds = 0.0)
    {
        ArgumentNullException.ThrowIfNull(closedLoop);
        return closedLoop.Denominator.Degree >= 1 && LoopStability.IsStableInS(closedLoop.Denominator)
            ? FromPoles(PolynomialRoots.Find(closedLoop.Denominator), delaySeconds)
            : null;
    }

    /// <summary>
    /// The estimates from the dominant pole among <paramref name="poles"/> (complex poles in conjugate pairs),
    /// with the times shifted by <paramref name="delaySeconds"/> (finite, &gt;= 0). Null when the list is empty or
    /// any pole has Re ≥ 0. Throws <see cref="ArgumentException"/> for a bad delay.
    /// </summary>
    public static SecondOrderEstimate? FromPoles(IReadOnlyList<Complex> poles, double delaySeconds = 0.0)
    {
        ArgumentNullException.ThrowIfNull(poles);
        if (!double.IsFinite(delaySeconds) || delaySeconds < 0.0)
        {
            throw new ArgumentException("Delay must be a finite number of seconds, 0 or above.", nameof(delaySeconds));
        }

        if (poles.Count == 0 || poles.Any(p => !(p.Real < 0.0)))
        {
            return null;
        }

        var dominant = Dominant(poles);
        double sigma = -dominant.Real, omegaD = Math.Abs(dominant.Imaginary), omegaN = Complex.Abs(dominant);
        double zeta = sigma / omegaN;
        bool oscillates = omegaD > 0.0;
        double overshoot = oscillates ? 100.0 * Math.Exp(-zeta * Math.PI / Math.Sqrt(1.0 - (zeta * zeta))) : 0.0;
        var used = oscillates
            ? ImmutableArray.Create(new Complex(dominant.Real, omegaD), new Complex(dominant.Real, -omegaD))
            : ImmutableArray.Create(dominant);
        return new SecondOrderEstimate(
            used,
            zeta,
            omegaN,
            overshoot,
            oscillates ? (Math.PI / omegaD) + delaySeconds : null,
            (NarrowBandDecays / sigma) + delaySeconds,
            (WideBandDecays / sigma) + delaySeconds);
    }

    private static Complex Dominant(IReadOnlyList<Complex> poles)
    {
        var best = poles[0];
        foreach (var p in poles.Skip(1))
        {
            double gap = (-p.Real) - (-best.Real);
            bool tie = Math.Abs(gap) <= TieTolerance * Math.Max(-p.Real, -best.Real);
            if ((!tie && gap < 0.0) || (tie && Math.Abs(p.Imaginary) > Math.Abs(best.Imaginary)))
            {
                best = p;
            }
        }

        return best;
    }
}
