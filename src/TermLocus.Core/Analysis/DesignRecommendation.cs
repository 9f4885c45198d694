namespace TermLocus.Core.Analysis;

/// <summary>The recommended swept value of a design and its confirmation by the full band check.</summary>
/// <param name="Value">The swept value that maximises the smallest relative margin over the nominal point and the
/// corners, inside the widest feasible interval.</param>
/// <param name="SmallestMargin">The smallest margin of the pole limits found by <see cref="LoopCheck.Run"/> at
/// <paramref name="Value"/>, which also searches inside the box; it may be below the corner figure the value was
/// chosen on.</param>
/// <param name="Check">That check in full (it also judges <c>max_overshoot_pct</c> on the simulated response, which the
/// design itself does not use).</param>
public sealed record DesignRecommendation(double Value, DesignMargin SmallestMargin, LoopCheckResult Check)
{
    /// <summary>True when the full band check (interior points included) passes at <see cref="Value"/>.</summary>
    public bool Confirmed => Check.Passed;
}
