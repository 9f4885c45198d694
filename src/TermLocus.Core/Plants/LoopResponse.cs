using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Time;

namespace TermLocus.Core.Plants;

/// <summary>
/// The closed-loop unit-step response of a plant's loop at given parameter values, in either plane, with the
/// figures the response views and <c>termlocus response</c> report.
/// <list type="bullet">
/// <item>Continuous loop: exact at every grid time (<see cref="ResponseMethod.Continuous"/>); with a delay, the
/// delay is simulated exactly inside the loop (<see cref="ResponseMethod.ExactDelay"/>), not through its Padé
/// approximant, except when it is shorter than half a grid step (<see cref="ResponseMethod.PadeDelay"/>). The grid is
/// <see cref="ResponseGrid.For"/> of the reference-to-output function (with the Padé factor when delayed, made at
/// least as long and as fine as that of the delay-free loop) plus the delay.</item>
/// <item>Sampled loop: the hybrid loop simulated exactly (<see cref="ResponseMethod.SampledBetweenSamples"/>,
/// <see cref="HeldLoopResponse"/>): the trace is the plant output (the output of controller·plant, not the sampled
/// sensor) at <see cref="PointsPerSample"/> points per sample interval (<see cref="HeldLoopResponse.PointsPerSample"/>),
/// and the figures are measured on it (<see cref="StepFigures.FromBetweenSamples"/>): an overshoot between samples is
/// what a rig shows, and what <c>max_overshoot_pct</c> is checked against. The output at the instants kT, which
/// equals the step response of the closed loop in z, is <see cref="SampleTrace"/> with its figures
/// <see cref="SampleFigures"/> (<see cref="StepFigures.FromSamples"/>). The instants run as long as
/// <see cref="ResponseGrid.ForSampled"/> asks for the output and for the controller output (a mode the controller
/// hides from the instants, ripple, still rings between them). When the parts do not allow the hybrid simulation the
/// trace is the output at the instants alone (<see cref="ResponseMethod.Sampled"/>, <see cref="Warning"/> says why).</item>
/// </list>
/// Stability, the steady state and the second-order estimates come from the characteristic polynomial's roots
/// (the Padé one for a delayed continuous loop, the same the locus shows), each root read through
/// <see cref="LoopPlane.ToEquivalentS"/>. The estimates use the dominant root pair; deadbeat roots (z = 0) are left
/// out; times are shifted by the delay, since the output is the delayed output of a loop with those roots.
/// </summary>
/// <param name="Plane">The loop's plane.</param>
/// <param name="Method">How the trace was made; <see cref="ResponseMethod.None"/> with a <paramref name="Failure"/>.</param>
/// <param name="Trace">The step response (times in seconds from the step); for a sampled loop the plant output between
/// samples, or the output at the instants alone with <see cref="ResponseMethod.Sampled"/>; null on failure.</param>
/// <param name="IsStable">True when every closed-loop root is strictly stable in its plane (also on failure: judged
/// from the roots of the characteristic polynomial then).</param>
/// <param name="SteadyState">The final value (the steady-state gain of reference to output); null when the loop is not
/// strictly stable or on failure.</param>
/// <param name="Figures">Rise, peak, overshoot and settling measured on the trace; null when
/// <paramref name="SteadyState"/> is null.</param>
/// <param name="Estimate">The dominant-pair estimates; null when the loop is not strictly stable, has no root
/// with a finite equivalent s, or on failure.</param>
/// <param name="Failure">Why there is no response (one line), or null.</param>
/// <param name="Warning">A caution that does not stop the response (see <see cref="LoopModel.SamplingWarning"/>), or null.</param>
public sealed record LoopResponse(
    LoopPlane Plane,
    ResponseMethod Method,
    ResponseTrace? Trace,
    bool IsStable,
    double? SteadyState,
    StepFigures? Figures,
    SecondOrderEstimate? Estimate,
    string? Failure,
    string? Warning)
{
    /// <summary>True when there is a trace (no <see cref="Failure"/>).</summary>
    public bool IsAvailable => Failure is null;

    /// <summary>
    /// For a sampled loop, the output at the sample instants kT, k = 0, 1, ... (seconds from the step); null for a
    /// continuous loop or on failure. With <see cref="ResponseMethod.SampledBetweenSamples"/> every
    /// <see cref="PointsPerSample"/>-th point of <see cref="Trace"/>; with <see cref="ResponseMethod.Sampled"/> the trace itself.
    /// </summary>
    public ResponseTrace? SampleTrace { get; init; }

    /// <summary>
    /// The figures of <see cref="SampleTrace"/> (<see cref="StepFigures.FromSamples"/>, the peak the largest sample);
    /// null when <see cref="SampleTrace"/> or <see cref="SteadyState"/> is.
    /// </summary>
    public StepFigures? SampleFigures { get; init; }

    /// <summary>The points per sample interval of <see cref="Trace"/> (&gt;= 1) with <see cref="ResponseMethod.SampledBetweenSamples"/>; null otherwise.</summary>
    public int? PointsPerSample { get; init; }

    /// <summary>
    /// The step response of <paramref name="model"/> at <paramref name="values"/> (names left out take their
    /// nominal values). A loop given by its characteristic polynomial alone, or whose reference-to-output path is
    /// improper (non-causal in z), gives a result with <see cref="Failure"/> set instead of a trace.
    /// </summary>
    /// <exception cref="PlantFileException">The loop cannot be formed at these values.</exception>
    /// <exception cref="ArgumentException">A name that is not a parameter, or a value that is not finite.</exception>
    public static LoopResponse Analyse(LoopModel model, IReadOnlyDictionary<string, double> values)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(values);
        if (model.HasGivenCharacteristic)
        {
            return Failed(model, values, "the loop gives only its characteristic polynomial, so there is no path from reference to output to simulate; give plant (and controller, sensor) instead");
        }

        var closed = model.ReferenceToOutput(values)!;
        if (closed.Numerator.Degree > closed.Denominator.Degree)
        {
            string why = model.Plane.IsSampled
                ? "the sampled closed loop is not causal (more zeros than poles in z): the controller needs at least as many poles as zeros"
                : "the closed loop from reference to output has more zeros than poles, so its step response holds impulses";
            return Failed(model, values, why);
        }

        return model.Plane.IsSampled ? SampledLoopResponse.Analyse(model, values, closed) : Continuous(model, values, closed);
    }

    private static LoopResponse Continuous(LoopModel model, IReadOnlyDictionary<string, double> values, RationalFunction closed)
    {
        double delay = model.DelaySeconds;
        var grid = delay > 0.0 ? DelayedGrid(model, values, closed) : ResponseGrid.For(closed);
        var poles = PolynomialRoots.Find(closed.Denominator);
        var (method, trace, failure) = delay > 0.0
            ? DelayedTrace(model, values, closed, grid)
            : (ResponseMethod.Continuous, StepResponse.Simulate(closed, grid), null);
        if (trace is null)
        {
            return Failed(model, values, failure!);
        }

        double? steady = StepFigures.SteadyStateOf(closed);
        return new LoopResponse(
            model.Plane,
            method,
            trace,
            LoopStability.IsStableInS(closed.Denominator),
            steady,
            StepFigures.From(trace, steady),
            SecondOrderEstimate.FromPoles(poles, delay),
            null,
            null);
    }

    private static (ResponseMethod, ResponseTrace?, string?) DelayedTrace(
        LoopModel model, IReadOnlyDictionary<string, double> values, RationalFunction closed, ResponseGrid grid)
    {
        double delay = model.DelaySeconds;
        double spacing = Spacing(grid);
        if (delay < spacing / 2.0)
        {
            var pade = model.Options.DelayOrder >= PadeApproximant.DefaultOrder ? closed : PadeClosedLoop(model, values);
            return (ResponseMethod.PadeDelay, StepResponse.Simulate(pade, grid), null);
        }

        int stepsPerDelay = (int)Math.Ceiling((delay / spacing) - 1e-9);
        var (forward, feedback) = model.DelayFreePaths(values)!.Value;
        return DelayedLoopResponse.TrySimulate(
            forward, feedback, model.IsPositiveFeedback, delay, grid.DurationSeconds, stepsPerDelay, out var trace, out var error)
            ? (ResponseMethod.ExactDelay, trace, null)
            : (ResponseMethod.None, null, "the delayed loop cannot be simulated: " + error);
    }

    // The grid of the Padé closed loop, stretched to the duration and resolution of the delay-free closed loop when
    // those are longer or finer: a short delay leaves the loop's own time scales in charge, and its approximant's
    // fast, badly scaled roots must not be the only thing that sets them.
    private static ResponseGrid DelayedGrid(LoopModel model, IReadOnlyDictionary<string, double> values, RationalFunction closed)
    {
        double delay = model.DelaySeconds;
        var pade = ResponseGrid.For(closed, delay);
        var (forward, feedback) = model.DelayFreePaths(values)!.Value;
        var open = forward * feedback;
        var characteristic = model.IsPositiveFeedback ? open.Denominator - open.Numerator : open.Denominator + open.Numerator;
        if (characteristic.IsZero)
        {
            return pade;
        }

        var free = ResponseGrid.For(new RationalFunction(forward.Numerator * feedback.Denominator, characteristic), delay);
        double duration = Math.Max(pade.DurationSeconds, free.DurationSeconds);
        double spacing = Math.Min(Spacing(pade), Spacing(free));
        double samples = Math.Clamp(Math.Ceiling(duration / spacing) + 1.0, ResponseGrid.MinimumAutomaticSamples, ResponseGrid.MaximumAutomaticSamples);
        return new ResponseGrid(duration, (int)samples);
    }

    private static double Spacing(ResponseGrid grid) => grid.DurationSeconds / (grid.Samples - 1);

    // The reference-to-output function with the delay's approximant of the default order, for a model built with
    // a lower one.
    private static RationalFunction PadeClosedLoop(LoopModel model, IReadOnlyDictionary<string, double> values)
    {
        var (forward, feedback) = model.DelayFreePaths(values)!.Value;
        var pade = PadeApproximant.Delay(model.DelaySeconds);
        var open = forward * feedback * pade;
        var sign = model.IsPositiveFeedback ? -1.0 : 1.0;
        var forwardNumerator = forward.Numerator * feedback.Denominator * pade.Numerator;
        return new RationalFunction(forwardNumerator, open.Denominator + open.Numerator.Scale(sign));
    }

    // No trace, but stability is still known from the characteristic polynomial's roots (the ones the locus and
    // the check use), so a stable loop without a response is not reported unstable.
    private static LoopResponse Failed(LoopModel model, IReadOnlyDictionary<string, double> values, string why)
    {
        var (characteristic, roots) = model.CharacteristicAndRoots(values);
        bool lostToInfinity = (roots ?? PolynomialRoots.FindWithInfinite(characteristic)).InfiniteCount > 0;
        bool stable = !lostToInfinity && (model.Plane.IsSampled
            ? LoopStability.IsStableInZ(characteristic)
            : LoopStability.IsStableInS(characteristic));
        return new(model.Plane, ResponseMethod.None, null, stable, null, null, null, why, null);
    }
}
