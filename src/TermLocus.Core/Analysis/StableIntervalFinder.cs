using System.Collections.Immutable;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Stable intervals from a set of candidate ends (every value where a pole can change half-plane: imaginary-axis
/// crossings and touches, degree drops). Between consecutive candidates stability cannot change, so one test at
/// the middle decides each gap. Adjacent stable gaps are kept apart: at a candidate some pole is on the axis (or at
/// infinity), so the loop is only marginally stable there.
/// </summary>
internal static class StableIntervalFinder
{
    /// <summary>A pole counts as stable when Re s &lt; −this share of the largest pole magnitude, so a pole that sits
    /// on the axis for every p (a hidden factor) is not mistaken for a stable one by rounding.</summary>
    private const double MarginShare = 1e-10;

    /// <summary>Candidates closer than this share of their magnitude are one value.</summary>
    private const double MergeShare = 1e-9;

    internal static ImmutableArray<StableInterval> Find(CharacteristicFamily family, double from, double to,
        int nominalDegree, IEnumerable<double> candidates)
    {
        var cuts = candidates.Where(c => c > from && c < to).Append(from).Append(to).Order().ToList();
        var distinct = new List<double>();
        foreach (double c in cuts)
        {
            if (distinct.Count == 0 || c - distinct[^1] > MergeShare * Math.Max(Math.Abs(c), Math.Abs(distinct[^1])))
            {
                distinct.Add(c);
            }
        }

        distinct[^1] = to;
        var result = new List<StableInterval>();
        for (int i = 0; i + 1 < distinct.Count; i++)
        {
            if (IsStable(family.At(0.5 * (distinct[i] + distinct[i + 1])), nominalDegree))
            {
                result.Add(new StableInterval(distinct[i], distinct[i + 1]));
            }
        }

        return [.. result];
    }

    /// <summary>True when P has its nominal degree and every root lies strictly in the left half-plane.</summary>
    internal static bool IsStable(Polynomial p, int nominalDegree)
    {
        if (p.IsZero || p.Degree != nominalDegree)
        {
            return false;
        }

        if (p.Degree == 0)
        {
            return true;
        }

        var roots = PolynomialRoots.Find(p);
        double size = roots.Max(r => r.Magnitude);
        return size > 0.0 && roots.All(r => r.Real < -MarginShare * size);
    }
}
