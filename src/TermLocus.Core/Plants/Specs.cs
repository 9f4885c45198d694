namespace TermLocus.Core.Plants;

/// <summary>The <c>[specs]</c> table: limits every closed-loop pole must meet. Every limit is optional (null).</summary>
/// <param name="MinDamping">Lowest allowed damping ratio ζ, dimensionless, in (-1, 1].</param>
/// <param name="MinDecayRate">Lowest allowed decay rate σ = -Re(s), 1/s.</param>
/// <param name="MaxTimeToHalfSeconds">Longest allowed time to half amplitude ln2/σ, s (&gt; 0).</param>
/// <param name="MaxSettlingTimeSeconds">Longest allowed 2 % settling time estimate 4/σ, s (&gt; 0).</param>
/// <param name="MinNaturalFrequency">Lowest allowed ωn = |s|, rad/s.</param>
/// <param name="MaxNaturalFrequency">Highest allowed ωn = |s|, rad/s.</param>
/// <param name="MaxOvershootPct">Largest allowed step-response overshoot, percent (checked on the simulated response).</param>
public sealed record Specs(
    double? MinDamping = null,
    double? MinDecayRate = null,
    double? MaxTimeToHalfSeconds = null,
    double? MaxSettlingTimeSeconds = null,
    double? MinNaturalFrequency = null,
    double? MaxNaturalFrequency = null,
    double? MaxOvershootPct = null)
{
    /// <summary>No limits at all.</summary>
    public static Specs None { get; } = new();
}
