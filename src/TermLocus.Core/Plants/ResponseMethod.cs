namespace TermLocus.Core.Plants;

/// <summary>How a <see cref="LoopResponse"/> was simulated.</summary>
public enum ResponseMethod
{
    /// <summary>No response: see <see cref="LoopResponse.Failure"/>.</summary>
    None,

    /// <summary>A continuous loop without delay: exact at every grid time (<see cref="Time.StepResponse"/>).</summary>
    Continuous,

    /// <summary>
    /// A continuous loop with the delay simulated exactly inside the loop at every grid time
    /// (<see cref="Time.DelayedLoopResponse"/>).
    /// </summary>
    ExactDelay,

    /// <summary>
    /// A continuous loop whose delay is shorter than half a grid step: the Padé closed loop of order at least 3,
    /// simulated exactly. Every mode the grid resolves then has |p|·T &lt; 0.11, where the order-3 approximant's
    /// phase error is below 2e-12 rad.
    /// </summary>
    PadeDelay,

    /// <summary>
    /// A sampled loop: the output at the sample instants alone, exact (<see cref="Time.StepResponse.SimulateSampled"/>).
    /// Since <see cref="SampledBetweenSamples"/>, only when the loop's parts do not allow the hybrid simulation (a
    /// controller with more zeros than poles in z, a plant or sensor improper on its own, or a singular sample instant);
    /// <see cref="LoopResponse.Warning"/> says why.
    /// </summary>
    Sampled,

    /// <summary>
    /// A sampled loop simulated as the hybrid system it is (<see cref="Time.HeldLoopResponse"/>): the trace is the
    /// plant output between the sample instants as well, the figures are measured on it, and the output at the
    /// instants with its own figures is in <see cref="LoopResponse.SampleTrace"/> and <see cref="LoopResponse.SampleFigures"/>.
    /// </summary>
    SampledBetweenSamples,
}
