using System.Collections.Immutable;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>Which limits end a feasible interval: those violated just outside each of its ends.</summary>
internal static class DesignLimits
{
    /// <summary>
    /// Steps outside an end tried in turn until some limit fails, as shares of max(|end|, 1e-3 · scale), the base the
    /// end was solved against (<see cref="SignIntervals"/>): the first is a hundred times a pole end's tolerance; an
    /// overshoot end, solved to <see cref="OvershootIntervals.RelTol"/>, is passed by the third.
    /// </summary>
    private static readonly double[] StepShares = [1e-10, 1e-9, 1e-8, 1e-7, 1e-6, 1e-5, 1e-4];

    /// <summary>
    /// The interval [<paramref name="from"/>, <paramref name="to"/>] with the keys violated just below
    /// <paramref name="from"/> and just above <paramref name="to"/> (lower end's first,
    /// deduplicated; in <see cref="DesignCriteria.Keys"/> order: pole limits in <see cref="SpecKind"/> order,
    /// <c>max_overshoot_pct</c>, then <see cref="DesignMargin.StabilityKey"/>). An end at the
    /// span's end is limited by the span, not by a spec, and adds nothing.
    /// </summary>
    public static FeasibleInterval Describe(DesignCriteria criteria, Interval span, double from, double to)
    {
        ImmutableArray<string> below = from > span.Low ? [.. ViolatedNear(criteria, span, from, -1.0)] : [];
        ImmutableArray<string> above = to < span.High ? [.. ViolatedNear(criteria, span, to, +1.0)] : [];
        return new FeasibleInterval(from, to, [.. below.Concat(above).Distinct(StringComparer.Ordinal)])
        {
            FromLimitedBy = below,
            ToLimitedBy = above,
        };
    }

    // The keys violated at the first step outside the end where anything fails, and at the step after it: two limits
    // that fail together are both named although the share that makes stability strict (or rounding) lets one of
    // them fail a hair before the other.
    private static List<string> ViolatedNear(DesignCriteria criteria, Interval span, double end, double direction)
    {
        double scale = Math.Max(Math.Abs(end), SignIntervals.ZeroFloorShare * RobustDesign.Scale(span));
        for (int i = 0; i < StepShares.Length; i++)
        {
            var keys = criteria.Violated(Math.Clamp(end + (direction * StepShares[i] * scale), span.Low, span.High));
            if (keys.Count == 0)
            {
                continue;
            }

            if (i + 1 < StepShares.Length)
            {
                keys.UnionWith(criteria.Violated(Math.Clamp(end + (direction * StepShares[i + 1] * scale), span.Low, span.High)));
            }

            return [.. criteria.Keys.Where(keys.Contains)];
        }

        return [];
    }
}
