using TermLocus.App.Text;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Cli;

/// <summary>A plant's locus for a verb: the swept family at the given values and the span it is traced over.</summary>
internal static class LocusInput
{
    /// <summary>
    /// The locus study of <paramref name="input"/> over --from/--to when given (both or either), else the plant's span.
    /// Throws <see cref="UsageException"/> for a span that is empty, reversed, not finite, or so wide that the
    /// characteristic polynomial cannot be solved across it (its coefficients overflow).
    /// </summary>
    public static LocusStudy Study(PlantInput input, double? from, double? to, TraceOptions? options = null)
    {
        var family = input.Model.Family(input.Plant.Loop.Sweep, input.Values);
        return LocusStudy.Run(family, input.Model.Plane, Span(input, family, from, to), input.Plant.Specs, options);
    }

    /// <summary>The span --from/--to choose (else the plant's), checked as <see cref="Study"/> checks it.</summary>
    public static Interval Span(PlantInput input, double? from, double? to) =>
        Span(input, input.Model.Family(input.Plant.Loop.Sweep, input.Values), from, to);

    private static Interval Span(PlantInput input, CharacteristicFamily family, double? from, double? to)
    {
        string sweep = input.Plant.Loop.Sweep;
        var span = SweepSpan.For(input.Plant, family, input.Values[sweep]);
        return Checked(family, sweep, from ?? span.Low, to ?? span.High);
    }

    private static Interval Checked(CharacteristicFamily family, string sweep, double low, double high)
    {
        string shown = $"the span from {NumberText.Exact(low)} to {NumberText.Exact(high)}";
        if (!double.IsFinite(low) || !double.IsFinite(high))
        {
            throw new UsageException($"{shown} is not finite");
        }

        if (!(low < high))
        {
            throw new UsageException($"{shown} is empty or reversed; give --from below --to");
        }

        if (!double.IsFinite(high - low))
        {
            throw new UsageException($"{shown} is wider than a double can hold; narrow it");
        }

        var span = new Interval(low, high);
        if (SweepSpan.FirstUnsolvable(family, span) is double bad)
        {
            throw new UsageException(
                $"{shown} is too wide: at {sweep} = {NumberText.Exact(bad)} the characteristic polynomial overflows "
                + "(its coefficients or roots are beyond double range); narrow it");
        }

        return span;
    }
}
