using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Time;

/// <summary>
/// A uniform simulation grid: <see cref="Samples"/> points from 0 to <see cref="DurationSeconds"/> inclusive.
/// <see cref="For"/> chooses one from the closed loop's poles:
/// <list type="bullet">
/// <item>Only modes that matter are counted: a pole whose step-response residue is below 1e-3 of the largest one
/// (a pole nearly cancelled by a zero, which the loop keeps on purpose) does not stretch the grid.</item>
/// <item>Duration: with a growing mode, 6/(largest growth rate) (a growth of e⁶ ≈ 400 shows the divergence);
/// otherwise the longest of 8/σ over decaying modes (e⁻⁸ ≈ 3e-4 of the slowest mode is left, well inside a
/// 2 % band) and four periods of any undamped oscillation; 10 s when no pole sets a time scale (integrators
/// only, or a static gain). The delay is added, and the result clamped to [1e-9, 1e9] s.</item>
/// <item>Samples: at least 30 per cycle of the fastest significant mode (cycle = 2π/|p|, which covers both
/// oscillation and real-pole speed), clamped to [501, 20001].</item>
/// </list>
/// </summary>
/// <param name="DurationSeconds">The last sample time in seconds, &gt; 0.</param>
/// <param name="Samples">The number of samples including t = 0, &gt;= 2.</param>
public sealed record ResponseGrid(double DurationSeconds, int Samples)
{
    /// <summary>The fewest samples <see cref="For"/> chooses.</summary>
    public const int MinimumAutomaticSamples = 501;

    /// <summary>The most samples <see cref="For"/> chooses.</summary>
    public const int MaximumAutomaticSamples = 20001;

    /// <summary>The fewest sample instants <see cref="ForSampled"/> chooses.</summary>
    public const int MinimumSampledSamples = 21;

    // With only deadbeat poles the response is over within degree samples; this many more show it settled.
    private const int DeadbeatSamples = 20;

    private const double SignificantResidue = 1e-3;

    // Roots closer than this (relative) are treated as one repeated pole; a root finder spreads a triple root by
    // about the cube root of machine epsilon, 6e-6.
    private const double ClusterTolerance = 1e-4;
    private const double DecayMultiple = 8.0;
    private const double GrowthMultiple = 6.0;
    private const double UndampedPeriods = 4.0;
    private const double SamplesPerCycle = 30.0;
    private const double DefaultDurationSeconds = 10.0;
    private const double ShortestDurationSeconds = 1e-9;
    private const double LongestDurationSeconds = 1e9;

    // A pole whose |Re| is below this fraction of its modulus is taken to lie on the imaginary axis.
    private const double AxisTolerance = 1e-9;

    /// <summary>
    /// The automatic grid for the step response of <paramref name="closedLoop"/> (rational in s) delayed by
    /// <paramref name="delaySeconds"/> (finite, &gt;= 0), by the rules in the type's summary.
    /// Throws <see cref="ArgumentException"/> for a negative or non-finite delay.
    /// </summary>
    public static ResponseGrid For(RationalFunction closedLoop, double delaySeconds = 0.0)
    {
        ArgumentNullException.ThrowIfNull(closedLoop);
        if (!double.IsFinite(delaySeconds) || delaySeconds < 0.0)
        {
            throw new ArgumentException("Delay must be a finite number of seconds, 0 or above.", nameof(delaySeconds));
        }

        var modes = SignificantPoles(closedLoop, s => 1.0 / s, s => s == Complex.Zero);
        double duration = BaseDuration(modes) + delaySeconds;
        duration = Math.Clamp(duration, ShortestDurationSeconds, LongestDurationSeconds);
        double fastest = modes.Count == 0 ? 0.0 : modes.Max(Complex.Abs);
        double wanted = Math.Ceiling(duration * fastest * SamplesPerCycle / (2.0 * Math.PI)) + 1.0;
        int samples = (int)Math.Clamp(wanted, MinimumAutomaticSamples, MaximumAutomaticSamples);
        return new ResponseGrid(duration, samples);
    }

    /// <summary>
    /// The number of sample instants for the step response of the sampled closed loop
    /// <paramref name="closedLoopInZ"/> (rational in z, sample time T = <paramref name="sampleTimeSeconds"/>, finite,
    /// &gt; 0) whose output is delayed by <paramref name="delaySeconds"/> (finite, &gt;= 0): the duration rules of
    /// <see cref="For"/> applied to the significant poles' equivalent s-plane points s = ln(z)/T (a pole at z = 0
    /// dies out within a sample and sets no time scale; with no other pole the duration is (degree + 20)·T), then
    /// one sample per T, at least <see cref="MinimumSampledSamples"/>, at most <see cref="MaximumAutomaticSamples"/>.
    /// Residues are those of Y(z) = H(z)·z/(z − 1). Throws <see cref="ArgumentException"/> for a bad time.
    /// </summary>
    public static ResponseGrid ForSampled(RationalFunction closedLoopInZ, double sampleTimeSeconds, double delaySeconds = 0.0)
    {
        ArgumentNullException.ThrowIfNull(closedLoopInZ);
        if (!double.IsFinite(sampleTimeSeconds) || sampleTimeSeconds <= 0.0)
        {
            throw new ArgumentException("Sample time must be a finite number of seconds above 0.", nameof(sampleTimeSeconds));
        }

        if (!double.IsFinite(delaySeconds) || delaySeconds < 0.0)
        {
            throw new ArgumentException("Delay must be a finite number of seconds, 0 or above.", nameof(delaySeconds));
        }

        var modes = SignificantPoles(closedLoopInZ, z => z / (z - 1.0), z => z == Complex.One)
            .Where(z => z != Complex.Zero)
            .Select(z => ZPlane.ToS(z, sampleTimeSeconds))
            .ToList();
        double fallback = (closedLoopInZ.Denominator.Degree + DeadbeatSamples) * sampleTimeSeconds;
        double duration = BaseDuration(modes, fallback) + delaySeconds;
        double wanted = Math.Ceiling(duration / sampleTimeSeconds) + 1.0;
        int samples = (int)Math.Clamp(wanted, MinimumSampledSamples, MaximumAutomaticSamples);
        return new ResponseGrid(sampleTimeSeconds * (samples - 1), samples);
    }

    private static double BaseDuration(List<Complex> modes, double fallback = DefaultDurationSeconds)
    {
        double growth = 0.0, slowestDecay = double.PositiveInfinity, slowestSwing = double.PositiveInfinity;
        foreach (var p in modes)
        {
            double modulus = Complex.Abs(p);
            if (Math.Abs(p.Real) <= AxisTolerance * modulus)
            {
                if (p.Imaginary != 0.0)
                {
                    slowestSwing = Math.Min(slowestSwing, Math.Abs(p.Imaginary));
                }
            }
            else if (p.Real > 0.0)
            {
                growth = Math.Max(growth, p.Real);
            }
            else
            {
                slowestDecay = Math.Min(slowestDecay, -p.Real);
            }
        }

        if (growth > 0.0)
        {
            return GrowthMultiple / growth;
        }

        double byDecay = double.IsPositiveInfinity(slowestDecay) ? 0.0 : DecayMultiple / slowestDecay;
        double bySwing = double.IsPositiveInfinity(slowestSwing) ? 0.0 : UndampedPeriods * 2.0 * Math.PI / slowestSwing;
        double longest = Math.Max(byDecay, bySwing);
        return longest > 0.0 ? longest : fallback;
    }

    // Residue of the step response Y = H·step at a simple pole p is N(p)·step(p) / D'(p) (step(s) = 1/s, or
    // step(z) = z/(z − 1)). Repeated poles (which a root finder returns as a tight cluster with huge, mutually
    // cancelling residues) and poles where the step itself has its pole always count; an isolated pole counts when
    // its residue is not negligible beside the largest isolated one.
    private static List<Complex> SignificantPoles(RationalFunction h, Func<Complex, Complex> step, Func<Complex, bool> atStepPole)
    {
        if (h.Denominator.Degree < 1)
        {
            return [];
        }

        var poles = PolynomialRoots.Find(h.Denominator);
        var slope = h.Denominator.Derivative();
        var weights = new double[poles.Length];
        for (int i = 0; i < poles.Length; i++)
        {
            var p = poles[i];
            bool clustered = atStepPole(p) || poles.Where((q, j) => j != i).Any(q => IsNear(p, q));
            weights[i] = clustered
                ? double.PositiveInfinity
                : Complex.Abs(h.Numerator.Evaluate(p) * step(p)) / Complex.Abs(slope.Evaluate(p));
        }

        double largest = weights.Where(double.IsFinite).DefaultIfEmpty(0.0).Max();
        return poles.Where((p, i) => double.IsPositiveInfinity(weights[i])
                                     || (weights[i] > 0.0 && weights[i] >= SignificantResidue * largest))
                    .ToList();
    }

    private static bool IsNear(Complex p, Complex q) =>
        Complex.Abs(p - q) <= ClusterTolerance * Math.Max(Complex.Abs(p), Complex.Abs(q));
}
