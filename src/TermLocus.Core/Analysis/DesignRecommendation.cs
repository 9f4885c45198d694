namespace TermLocus.Core.Analysis;

/// <summary>The recommended swept value of a design and its confirmation by the full band check.</summary>
/// <param name="Value">The swept value that maximises the smallest relative margin over the nominal point and the
/// corners, inside the widest feasible interval, rounded to <see cref="RobustDesign.RecommendedDigits"/> significant
/// digits (more only where the interval needs them), so its shortest spelling is short.</param>
/// <param name="SmallestMargin">The smallest margin of the limits the design judged (the pole limits, and
/// <c>max_overshoot_pct</c> when <see cref="DesignResult.OvershootJudged"/>) found by <see cref="LoopCheck.Run"/> at
/// <paramref name="Value"/>, which also searches inside the box for the pole limits; it may be below the corner figure
/// the value was chosen on.</param>
/// <param name="Check">That check in full; its overshoot figures are the ones the design judged.</param>
public sealed record DesignRecommendation(double Value, DesignMargin SmallestMargin, LoopCheckResult Check)
{
    /// <summary>True when the full band check (interior points included) passes at <see cref="Value"/>.</summary>
    public bool Confirmed => Check.Passed;
}
