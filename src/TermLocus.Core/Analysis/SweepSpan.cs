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
}
