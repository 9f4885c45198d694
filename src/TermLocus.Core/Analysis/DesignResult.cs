using System.Collections.Immutable;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>The result of <see cref="RobustDesign.Find"/>.</summary>
/// <param name="Sweep">The swept parameter's name.</param>
/// <param name="Span">The span of the swept parameter searched.</param>
/// <param name="Box">The tolerance box (the swept parameter excluded).</param>
/// <param name="PointsChecked">How many band points the intervals were judged at: the nominal point and every corner.</param>
/// <param name="Intervals">The feasible intervals, ascending and disjoint; empty when no value meets every spec.</param>
/// <param name="Recommended">The recommended value, or null when there is no interval.</param>
public sealed record DesignResult(
    string Sweep,
    Interval Span,
    ToleranceBox Box,
    int PointsChecked,
    ImmutableArray<FeasibleInterval> Intervals,
    DesignRecommendation? Recommended)
{
    /// <summary>
    /// True when the intervals honour <c>max_overshoot_pct</c> too, judged on the simulated step response at every
    /// point checked; false when the specs set no such limit or the loop gives only its characteristic polynomial
    /// (then there is no response, and the band check cannot judge it either).
    /// </summary>
    public bool OvershootJudged { get; init; }

    /// <summary>True when some value of the span meets every spec at every point checked.</summary>
    public bool Feasible => !Intervals.IsEmpty;

    /// <summary>The widest interval (the first of equally wide ones), or null.</summary>
    public FeasibleInterval? Widest => Intervals.IsEmpty ? null : Intervals.MaxBy(i => i.Width);
}
