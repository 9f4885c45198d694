using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Stability facts of a sampled loop, whose characteristic polynomial is in z: the swept values where a root crosses
/// the unit circle, and the sub-ranges where every root lies strictly inside it. Ends are solved by bisection on the
/// largest root magnitude to <see cref="SignIntervals.DefaultRelTol"/>, bracketed on a uniform grid refined by the
/// values where the family drops degree.
/// </summary>
public static class UnitCircleStability
{
    /// <summary>Grid points used to bracket crossings.</summary>
    public const int GridPoints = 801;

    /// <summary>
    /// The stable sub-ranges of [<paramref name="from"/>, <paramref name="to"/>], ascending. Throws
    /// <see cref="ArgumentException"/> when from &gt;= to.
    /// An end within <see cref="IsInside"/>'s margin of a span end is that span end: a root sitting on the circle
    /// there (an integrator's z = 1 at zero gain) moves inside so slowly that rounding of the roots, not the loop,
    /// would otherwise place the end (at 1e-9 in the 0 to 1000 span of the digital-servo demo).
    /// </summary>
    public static ImmutableArray<StableInterval> StableIntervals(CharacteristicFamily family, double from, double to) =>
        [.. SignIntervals.Find(p => Margin(family, p), from, to, GridPoints)
            .Select(i => new StableInterval(ToSpanEnd(i.From, from, to), ToSpanEnd(i.To, from, to)))
            .Where(i => i.From < i.To)];

    /// <summary>
    /// The unit-circle crossings inside the span: the swept value and the crossing root's angle ωT in radians
    /// (0 at z = 1, π at z = -1), ascending by value.
    /// </summary>
    public static ImmutableArray<(double Value, double AngleRadians)> Crossings(CharacteristicFamily family, double from, double to)
    {
        var result = ImmutableArray.CreateBuilder<(double, double)>();
        foreach (var interval in StableIntervals(family, from, to))
        {
            foreach (double end in new[] { interval.From, interval.To })
            {
                if (IsInside(end, from, to))
                {
                    var z = PolynomialRoots.Find(family.At(end)).MaxBy(Complex.Abs);
                    result.Add((end, Math.Abs(z.Phase)));
                }
            }
        }

        return result.ToImmutable();
    }

    /// <summary>
    /// True when <paramref name="value"/> lies inside the span by more than a millionth of its width: an interval
    /// end closer to a span end is the span end itself (a root sitting on the circle there, such as an integrator's
    /// z = 1 at a zero gain), not a crossing.
    /// </summary>
    internal static bool IsInside(double value, double from, double to)
    {
        double margin = 1e-6 * (to - from);
        return value > from + margin && value < to - margin;
    }

    private static double ToSpanEnd(double value, double from, double to) =>
        IsInside(value, from, to) ? value : value - from <= to - value ? from : to;

    // Positive when every root is strictly inside the unit circle.
    private static double Margin(CharacteristicFamily family, double p)
    {
        var polynomial = family.At(p);
        if (polynomial.IsZero)
        {
            return double.NaN;
        }

        var roots = PolynomialRoots.FindWithInfinite(polynomial);
        if (roots.InfiniteCount > 0)
        {
            return -1.0; // a root at infinity is outside the circle
        }

        return roots.Finite.IsEmpty ? 1.0 : 1.0 - roots.Finite.Max(Complex.Abs);
    }
}
