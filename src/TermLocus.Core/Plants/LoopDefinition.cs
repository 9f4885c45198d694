namespace TermLocus.Core.Plants;

/// <summary>Sign of the feedback summing junction.</summary>
public enum FeedbackSign
{
    /// <summary>Characteristic polynomial from 1 + C·G·H.</summary>
    Negative,

    /// <summary>Characteristic polynomial from 1 - C·G·H.</summary>
    Positive,
}

/// <summary>
/// The <c>[loop]</c> table. Either <see cref="Plant"/> (with optional controller and sensor) or
/// <see cref="Characteristic"/> is set, never both.
/// </summary>
/// <param name="Plant">Plant transfer function G(s), or null when the characteristic polynomial is given.</param>
/// <param name="Controller">Controller C(s); null means 1.</param>
/// <param name="Sensor">Feedback path H(s); null means 1.</param>
/// <param name="Feedback">Sign of the feedback.</param>
/// <param name="Characteristic">The characteristic polynomial given directly, or null.</param>
/// <param name="Sweep">Name of the swept parameter (exists in [parameters]).</param>
/// <param name="Vary">Name of the toleranced parameter stepped through its band, or null (then the first toleranced one).</param>
/// <param name="DelaySeconds">Transport delay in seconds (&gt;= 0), or null.</param>
/// <param name="SampleTimeSeconds">Sample time of a sampled controller with zero-order hold, seconds (&gt; 0), or null.</param>
public sealed record LoopDefinition(
    ExpressionText? Plant,
    ExpressionText? Controller,
    ExpressionText? Sensor,
    FeedbackSign Feedback,
    ExpressionText? Characteristic,
    string Sweep,
    string? Vary,
    double? DelaySeconds,
    double? SampleTimeSeconds);
