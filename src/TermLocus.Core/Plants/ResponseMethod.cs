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

    /// <summary>A sampled loop: the output at the sample instants, exact (<see cref="Time.StepResponse.SimulateSampled"/>).</summary>
    Sampled,
}
