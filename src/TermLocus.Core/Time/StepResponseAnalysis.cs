using TermLocus.Core.Algebra;

namespace TermLocus.Core.Time;

/// <summary>
/// Everything the step-response views report for one closed loop: the simulated trace on the automatic grid
/// (<see cref="ResponseGrid.For"/>), the steady state, the measured figures and the second-order estimates.
/// </summary>
/// <param name="Trace">The exact sampled step response (times in seconds).</param>
/// <param name="SteadyState">The steady-state gain; null when the loop is not strictly stable.</param>
/// <param name="Figures">Figures measured on the trace; null when <paramref name="SteadyState"/> is null.</param>
/// <param name="Estimate">Dominant-pole estimates; null when the loop is not strictly stable.</param>
public sealed record StepResponseAnalysis(
    ResponseTrace Trace,
    double? SteadyState,
    StepFigures? Figures,
    SecondOrderEstimate? Estimate)
{
    /// <summary>
    /// Analyses the step response of <paramref name="closedLoop"/> (proper, rational in s) delayed by
    /// <paramref name="delaySeconds"/> (finite, &gt;= 0; see <see cref="StepResponse"/> for what the delay means).
    /// Throws <see cref="ArgumentException"/> for an improper loop or a bad delay.
    /// </summary>
    public static StepResponseAnalysis Of(RationalFunction closedLoop, double delaySeconds = 0.0)
    {
        ArgumentNullException.ThrowIfNull(closedLoop);
        var grid = ResponseGrid.For(closedLoop, delaySeconds);
        var trace = StepResponse.Simulate(closedLoop, grid, delaySeconds);
        double? steadyState = StepFigures.SteadyStateOf(closedLoop);
        return new StepResponseAnalysis(
            trace,
            steadyState,
            StepFigures.From(trace, steadyState),
            SecondOrderEstimate.Of(closedLoop, delaySeconds));
    }
}
