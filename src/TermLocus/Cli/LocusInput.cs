using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Cli;

/// <summary>A plant's locus for a verb: the swept family at the given values and the span it is traced over.</summary>
internal static class LocusInput
{
    /// <summary>
    /// The locus study of <paramref name="input"/> over --from/--to when given (both or either), else the plant's span.
    /// Throws <see cref="UsageException"/> for a reversed or empty span.
    /// </summary>
    public static LocusStudy Study(PlantInput input, double? from, double? to, TraceOptions? options = null)
    {
        string sweep = input.Plant.Loop.Sweep;
        var family = input.Model.Family(sweep, input.Values);
        var span = SweepSpan.For(input.Plant, family, input.Values[sweep]);
        double low = from ?? span.Low, high = to ?? span.High;
        if (!(low < high) || !double.IsFinite(low) || !double.IsFinite(high))
        {
            throw new UsageException($"the span from {low} to {high} is empty or reversed");
        }

        return LocusStudy.Run(family, input.Model.Plane, new Interval(low, high), input.Plant.Specs, options);
    }
}
