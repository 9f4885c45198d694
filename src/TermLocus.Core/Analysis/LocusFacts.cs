using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The construction facts of a root locus over [<see cref="From"/>, <see cref="To"/>]. For an affine family
/// P = A + p·B they are those of the loop p·B/A; for other families only the axis crossings and stable intervals
/// apply (found numerically), and the other lists are empty.
/// </summary>
/// <param name="From">Lowest analysed swept value.</param>
/// <param name="To">Highest analysed swept value (&gt; From).</param>
/// <param name="IsAffine">True when the family is affine in p and every fact applies.</param>
/// <param name="OpenLoopPoles">Roots of A, rad/s, sorted by real then imaginary part (empty when not affine).</param>
/// <param name="OpenLoopZeros">Roots of B, rad/s, sorted likewise (empty when not affine or B is constant).</param>
/// <param name="Asymptotes">One set per sign of p in the range, positive first; empty when n &lt;= m or not affine.</param>
/// <param name="BreakPoints">Break points with p in the range, by p.</param>
/// <param name="AxisCrossings">Imaginary-axis crossings with p in the range, by p then ω. Open-loop poles on the
/// axis (p = 0) appear only when 0 lies strictly inside the range; for families that are not affine, poles on the
/// axis exactly at an end of the range are not listed.</param>
/// <param name="DepartureAngles">Departure directions at complex open-loop poles, for each sign of p in the range.</param>
/// <param name="ArrivalAngles">Arrival directions at complex open-loop zeros, for each sign of p in the range.</param>
/// <param name="StableIntervals">Sub-ranges where every pole is in the open left half-plane, ascending; several for a
/// conditionally stable loop, none when the loop is never stable in the range.</param>
public sealed record LocusFacts(
    double From,
    double To,
    bool IsAffine,
    ImmutableArray<Complex> OpenLoopPoles,
    ImmutableArray<Complex> OpenLoopZeros,
    ImmutableArray<AsymptoteSet> Asymptotes,
    ImmutableArray<BreakPoint> BreakPoints,
    ImmutableArray<AxisCrossing> AxisCrossings,
    ImmutableArray<AngleConditionDirection> DepartureAngles,
    ImmutableArray<AngleConditionDirection> ArrivalAngles,
    ImmutableArray<StableInterval> StableIntervals)
{
    /// <summary>
    /// Computes the facts over [<paramref name="from"/>, <paramref name="to"/>]. Values (break points, crossings,
    /// interval ends) are solved on the exact equations to at least 1e-9 relative. <paramref name="options"/> only
    /// matters for families that are not affine, whose crossings are bracketed on a trace. Throws
    /// <see cref="ArgumentException"/> when the range is not finite or from &gt;= to, or when B is the zero polynomial.
    /// </summary>
    public static LocusFacts Compute(CharacteristicFamily family, double from, double to, TraceOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(family);
        if (!double.IsFinite(from) || !double.IsFinite(to) || from >= to)
        {
            throw new ArgumentException($"The analysed range must be finite with from < to (got {from}, {to}).");
        }

        return family.Affine is { } split ? FromAffine(family, split, from, to) : FromScan(family, from, to, options);
    }

    private static LocusFacts FromAffine(CharacteristicFamily family, AffineSplit split, double from, double to)
    {
        if (split.B.IsZero)
        {
            throw new ArgumentException("The swept parameter does not appear in the characteristic polynomial (B = 0).");
        }

        var poles = Roots(split.A);
        var zeros = Roots(split.B);
        var crossings = AxisCrossingFinder.Solutions(split);
        var drops = TraceDegreeDrops.Find(family, from, to);
        var candidates = crossings.Select(c => c.Value).Concat(drops.Values);
        return new LocusFacts(
            from,
            to,
            true,
            poles,
            zeros,
            AsymptoteFinder.Find(split, from, to),
            BreakPointFinder.Find(split, from, to),
            AxisCrossingFinder.Find(split, from, to),
            AngleConditionFinder.Departures(split, poles, zeros, from, to),
            AngleConditionFinder.Arrivals(split, poles, zeros, from, to),
            StableIntervalFinder.Find(family, from, to, drops.NominalDegree, candidates));
    }

    private static LocusFacts FromScan(CharacteristicFamily family, double from, double to, TraceOptions? options)
    {
        var trace = LocusTracer.Trace(family, from, to, options);
        var crossings = TraceCrossingFinder.Find(family, trace, s => -s.Real);
        // A pole sitting on the axis exactly at an end of the range cannot be seen to cross from inside it.
        var axis = crossings
            .Where(c => !LocusRange.AtEnd(from, to, c.Value))
            .Select(c => new AxisCrossing(
                Math.Abs(c.Pole.Imaginary),
                c.Value,
                c.Entering ? AxisCrossingDirection.IntoLeftHalfPlane : AxisCrossingDirection.IntoRightHalfPlane))
            .ToImmutableArray();
        var drops = TraceDegreeDrops.Find(family, from, to);
        var touches = TraceCrossingFinder.FindTouches(family, trace, s => -s.Real);
        var candidates = crossings.Select(c => c.Value).Concat(drops.Values).Concat(touches);
        return new LocusFacts(
            from,
            to,
            false,
            [],
            [],
            [],
            [],
            axis,
            [],
            [],
            StableIntervalFinder.Find(family, from, to, drops.NominalDegree, candidates));
    }

    private static ImmutableArray<Complex> Roots(Polynomial p) => p.Degree < 1 ? [] : [.. PolynomialRoots.Find(p)];
}
