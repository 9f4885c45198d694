using System.Collections.Immutable;
using System.Diagnostics.CodeAnalysis;
using System.Globalization;
using System.Numerics;
using System.Runtime.InteropServices;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Time;

/// <summary>
/// The unit-step response of a sampled loop simulated as the hybrid system it is, so the plant output is known
/// between the sample instants too: the controller C(z) runs at the instants kT on e_k = r_k ∓ y_s(kT); its output
/// u_k is held (zero-order hold), passes a transport delay τ = m·T + τ' (0 &lt;= τ' &lt; T) and drives the continuous
/// plant G(s); the sensor H(s), continuous too, turns the plant output y into the sampled y_s. Reference r_k = 1 for
/// k &gt;= 0, everything at rest before.
/// <para>Method (exact, no integration error): plant and sensor in series are one state space x' = A·x + B·v
/// (<see cref="HeldPlantSystem"/>); over an interval the plant input v is piecewise constant (u_{k−m−1} until
/// kT + τ', u_{k−m} after), so x(kT + σ) = e^{Aσ}·x(kT) + (∫₀^σ e^{Aρ}dρ)·B·v, from augmented matrix exponentials
/// (<see cref="IntersampleOffsets"/>). The controller is a discrete state space; with no delay and feed-through in
/// both controller and plant·sensor the sample instant is an algebraic loop, solved exactly:
/// u_k = (C_c·ξ_k + D_c·(r_k ∓ C·x_k)) / (1 ± D_c·D).</para>
/// <para>Conventions, those of the z-plane path (<see cref="ZeroOrderHold.Discretise(RationalFunction, double, double)"/>),
/// so the values at the instants are the step response of C·G_τ/(1 ± C·(G·H)_τ) in z: a sample taken at kT sees the
/// plant input just after kT (u_k itself when there is no delay). Rounding only: the instants agree with the z-plane
/// response to about 1e-12 in the tests; a long run grows the error like the state recursion's.</para>
/// </summary>
public static class HeldLoopResponse
{
    /// <summary>The fewest points per sample interval <see cref="PointsPerSample"/> chooses.</summary>
    public const int MinimumPointsPerSample = 10;

    /// <summary>The most points per sample interval <see cref="PointsPerSample"/> chooses or the simulation takes.</summary>
    public const int MaximumPointsPerSample = 200;

    /// <summary>The most points of one between-samples trace.</summary>
    public const int MaximumPoints = 100_001;

    // 30 points per cycle of the fastest plant mode, as the continuous grid (ResponseGrid.For).
    private const double PointsPerCycle = 30.0;

    // 1 ± D_c·D closer to 0 than this leaves the sample instant's algebraic loop without a solution.
    private const double SingularLoopTolerance = 1e-12;

    /// <summary>
    /// The points per sample interval for <paramref name="plant"/> (rational in s) held over
    /// <paramref name="sampleTimeSeconds"/> (finite, &gt; 0) in a response of <paramref name="samples"/> instants
    /// (&gt;= 2). Between samples the output moves with the plant's own modes (the input is constant there), so the
    /// count is 30 points per cycle 2π/|p| of the fastest plant pole p, ⌈30·|p|·T/(2π)⌉, at least
    /// <see cref="MinimumPointsPerSample"/> (so a slow plant's curve between samples still shows its bend and the peak
    /// is located to a tenth of a sample or better), at most <see cref="MaximumPointsPerSample"/> (|p|·T up to 42), and cut so
    /// the trace holds at most <see cref="MaximumPoints"/> points (at least 1: then only the instants).
    /// Throws <see cref="ArgumentException"/> for a bad time or count.
    /// </summary>
    public static int PointsPerSample(RationalFunction plant, double sampleTimeSeconds, int samples)
    {
        ArgumentNullException.ThrowIfNull(plant);
        if (!double.IsFinite(sampleTimeSeconds) || sampleTimeSeconds <= 0.0)
        {
            throw new ArgumentException("Sample time must be a finite number of seconds above 0.", nameof(sampleTimeSeconds));
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(samples, 2);
        double fastest = plant.Denominator.Degree < 1 ? 0.0 : PolynomialRoots.Find(plant.Denominator).Select(Complex.Abs).Max();
        double wanted = Math.Ceiling(PointsPerCycle * fastest * sampleTimeSeconds / (2.0 * Math.PI));
        int points = (int)Math.Clamp(double.IsFinite(wanted) ? wanted : MaximumPointsPerSample, MinimumPointsPerSample, MaximumPointsPerSample);
        int budget = (MaximumPoints - 1) / (samples - 1);
        return Math.Max(1, Math.Min(points, budget));
    }

    /// <summary>
    /// The step response of the loop with controller <paramref name="controllerInZ"/> (proper, rational in z), plant
    /// <paramref name="plant"/> and sensor <paramref name="sensor"/> (each proper, rational in s), feedback sign
    /// (<paramref name="positiveFeedback"/>: e = r + y_s), sample time T = <paramref name="sampleTimeSeconds"/>
    /// (finite, &gt; 0) and delay <paramref name="delaySeconds"/> (finite, &gt;= 0, at most 1000 intervals) between hold
    /// and plant, over <paramref name="samples"/> instants (&gt;= 2) with <paramref name="pointsPerSample"/> points per
    /// interval (1 to <see cref="MaximumPointsPerSample"/>, at most <see cref="MaximumPoints"/> in all). Throws
    /// <see cref="ArgumentException"/> where <see cref="TrySimulate"/> returns false.
    /// </summary>
    public static SampledLoopTrace Simulate(
        RationalFunction controllerInZ,
        RationalFunction plant,
        RationalFunction sensor,
        bool positiveFeedback,
        double sampleTimeSeconds,
        double delaySeconds,
        int samples,
        int pointsPerSample) =>
        TrySimulate(controllerInZ, plant, sensor, positiveFeedback, sampleTimeSeconds, delaySeconds, samples, pointsPerSample, out var trace, out var error)
            ? trace
            : throw new ArgumentException(error);

    /// <summary>
    /// As <see cref="Simulate"/>, returning false with a one-line reason when an argument is out of range, the
    /// controller is not causal (more zeros than poles in z), plant or sensor on its own is improper, or the sample
    /// instant's algebraic loop is singular (1 ± D_c·D = 0).
    /// </summary>
    public static bool TrySimulate(
        RationalFunction controllerInZ,
        RationalFunction plant,
        RationalFunction sensor,
        bool positiveFeedback,
        double sampleTimeSeconds,
        double delaySeconds,
        int samples,
        int pointsPerSample,
        [NotNullWhen(true)] out SampledLoopTrace? trace,
        [NotNullWhen(false)] out string? error)
    {
        ArgumentNullException.ThrowIfNull(controllerInZ);
        ArgumentNullException.ThrowIfNull(plant);
        ArgumentNullException.ThrowIfNull(sensor);
        trace = null;
        error = Check(sampleTimeSeconds, delaySeconds, samples, pointsPerSample, out var delay);
        if (error is not null || !HeldPlantSystem.TryOf(plant, sensor, out var held, out error))
        {
            return false;
        }

        if (!StateSpace.TryFromTransferFunction(controllerInZ, out var controller, out _))
        {
            error = "the controller has more zeros than poles in z, so it is not causal";
            return false;
        }

        double sign = positiveFeedback ? 1.0 : -1.0;
        bool instantLoop = delay.WholeSamples == 0 && delay.RemainderSeconds == 0.0;
        double loopGain = 1.0 - (sign * controller.D * held.Series.D);
        if (instantLoop && Math.Abs(loopGain) <= SingularLoopTolerance)
        {
            error = "controller and plant*sensor both pass the sample straight through with a loop gain of 1, so the loop has no solution at the sample instants";
            return false;
        }

        var offsets = IntersampleOffsets.Of(held, sampleTimeSeconds, delay.RemainderSeconds, pointsPerSample);
        var run = new HeldLoopRun(controller, held, offsets, sign, delay.WholeSamples, delay.RemainderSeconds > 0.0, instantLoop ? loopGain : 1.0);
        var outputs = run.Outputs(samples);
        trace = Pack(outputs, sampleTimeSeconds, pointsPerSample);
        return true;
    }

    // The arrays become the traces' storage without a copy: a long trace is one large-object allocation, not two.
    private static SampledLoopTrace Pack(double[] outputs, double sampleTime, int points)
    {
        double h = sampleTime / points;
        int samples = ((outputs.Length - 1) / points) + 1;
        var times = new double[outputs.Length];
        var sampleTimes = new double[samples];
        var sampleOutputs = new double[samples];
        for (int k = 0; k < samples; k++)
        {
            double start = k * sampleTime;
            sampleTimes[k] = start;
            sampleOutputs[k] = outputs[k * points];
            for (int j = 0; j < points && (k * points) + j < times.Length; j++)
            {
                times[(k * points) + j] = start + (j * h);
            }
        }

        return new SampledLoopTrace(
            new ResponseTrace(ImmutableCollectionsMarshal.AsImmutableArray(times), ImmutableCollectionsMarshal.AsImmutableArray(outputs)),
            new ResponseTrace(ImmutableCollectionsMarshal.AsImmutableArray(sampleTimes), ImmutableCollectionsMarshal.AsImmutableArray(sampleOutputs)),
            points);
    }

    private static string? Check(double sampleTime, double delaySeconds, int samples, int points, out SampleDelay delay)
    {
        delay = default;
        if (!double.IsFinite(sampleTime) || sampleTime <= 0.0)
        {
            return "Sample time must be a finite number of seconds above 0, got " + sampleTime.ToString("R", CultureInfo.InvariantCulture) + ".";
        }

        if (!double.IsFinite(delaySeconds) || delaySeconds < 0.0)
        {
            return "Delay must be a finite number of seconds, 0 or above, got " + delaySeconds.ToString("R", CultureInfo.InvariantCulture) + ".";
        }

        if (!SampleDelay.TrySplit(delaySeconds, sampleTime, out delay))
        {
            return $"Delay spans more than {SampleDelay.MaximumWholeSamples} sample intervals.";
        }

        if (samples < 2 || points < 1 || points > MaximumPointsPerSample)
        {
            return $"Need at least 2 samples and 1 to {MaximumPointsPerSample} points per sample, got {samples} and {points}.";
        }

        return ((long)(samples - 1) * points) + 1 > MaximumPoints
            ? $"The trace would hold more than {MaximumPoints} points; use fewer samples or points per sample."
            : null;
    }
}
