using TermLocus.Core.Algebra;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>The span of the swept parameter that the locus is traced over, the same for every verb and the workbench.</summary>
public static class SweepSpan
{
    /// <summary>
    /// The file's <c>range</c> when it has one; otherwise the automatic range of <paramref name="family"/> (from 0 past
    /// the locus's structure), widened by half again when needed so it holds <paramref name="currentValue"/>.
    /// </summary>
    public static Interval For(Plant plant, CharacteristicFamily family, double currentValue)
    {
        ArgumentNullException.ThrowIfNull(plant);
        if (plant.SweptParameter.Range is { } range)
        {
            return range;
        }

        var automatic = LocusTracer.AutomaticRange(family);
        double low = Math.Min(automatic.Low, currentValue < 0 ? 1.5 * currentValue : automatic.Low);
        double high = Math.Max(automatic.High, currentValue > 0 ? 1.5 * currentValue : automatic.High);
        return new Interval(low, high);
    }

    /// <summary>Values of the span (its ends included, evenly spread) at which <see cref="FirstUnsolvable"/> tries the family.</summary>
    public const int SolvabilityProbes = 65;

    /// <summary>
    /// The first value of <paramref name="span"/> (ascending, among <see cref="SolvabilityProbes"/> evenly spread
    /// values, the ends included) at which <paramref name="family"/>'s polynomial has a coefficient that is not
    /// finite or roots that cannot be found in double precision, or null when every probe can be solved. A span far
    /// wider than the loop's scale (±1e308, say) makes the coefficients overflow, and no trace could be drawn over it.
    /// Throws <see cref="ArgumentException"/> when the ends are not finite, not ascending, or further apart than a
    /// double holds; exceptions of <paramref name="family"/> itself pass through.
    /// </summary>
    public static double? FirstUnsolvable(CharacteristicFamily family, Interval span)
    {
        ArgumentNullException.ThrowIfNull(family);
        if (!double.IsFinite(span.Low) || !double.IsFinite(span.High) || !(span.Low < span.High) || !double.IsFinite(span.Width))
        {
            throw new ArgumentException("The span must have finite, ascending ends a finite width apart.", nameof(span));
        }

        for (int i = 0; i < SolvabilityProbes; i++)
        {
            double p = i == SolvabilityProbes - 1 ? span.High : span.Low + (span.Width * i / (SolvabilityProbes - 1));
            var polynomial = family.At(p);
            if (!polynomial.IsZero && !PolynomialRoots.TryFind(polynomial, out _))
            {
                return p;
            }
        }

        return null;
    }
}
