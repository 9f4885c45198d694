using TermLocus.Core.Time;

namespace TermLocus.Core.Plants;

/// <summary>Choices made when a <see cref="LoopModel"/> is built that the plant file does not fix.</summary>
public sealed record LoopModelOptions
{
    /// <summary>The options used by <see cref="LoopModel.Create(Plant)"/>.</summary>
    public static LoopModelOptions Default { get; } = new();

    /// <summary>
    /// The order n of the [n/n] Padé approximant that stands for a transport delay in a continuous loop's
    /// characteristic polynomial and locus, in [1, <see cref="PadeApproximant.MaximumOrder"/>]; default
    /// <see cref="PadeApproximant.DefaultOrder"/> (3). Each order adds one pole and one right-half-plane zero to the
    /// loop. Not used by sampled loops, where a delay is exact, nor by the step response, which simulates the delay
    /// exactly.
    /// </summary>
    public int DelayOrder { get; init; } = PadeApproximant.DefaultOrder;
}
