using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>
/// Where the toleranced ("varied") parameter stands in its band. ↑/↓ step it by a fraction of the band (a tenth at
/// first; { and } make it finer or coarser), stopping at its nominal value too; every other parameter stays at its
/// nominal value.
/// </summary>
/// <param name="Parameter">The varied parameter's name (an identifier, safe to print), or null when the plant has no
/// toleranced parameter besides the swept one.</param>
/// <param name="Unit">Its unit from the file (untrusted), empty when absent.</param>
/// <param name="Nominal">Its value in the file.</param>
/// <param name="Band">Its tolerance band, Low &lt;= Nominal &lt;= High.</param>
/// <param name="Value">The value being looked at, inside the band.</param>
public sealed record VariedPosition(string? Parameter, string Unit, double Nominal, Interval Band, double Value)
{
    /// <summary>Steps across the band when a plant is opened.</summary>
    public const int DefaultDivisions = 10;

    /// <summary>
    /// The choices of steps across the band, coarsest first: halves reach the corners and nominal in a key or two;
    /// a hundredth finds where a spec starts to fail.
    /// </summary>
    public static IReadOnlyList<int> DivisionSeries { get; } = [2, 5, 10, 20, 50, 100];

    /// <summary>No varied parameter.</summary>
    public static VariedPosition None { get; } = new(null, string.Empty, 0, new Interval(0, 0), 0);

    /// <summary>True when the value is the nominal one (always, without a varied parameter).</summary>
    public bool IsNominal => Value == Nominal;

    /// <summary>Steps across the band, one of <see cref="DivisionSeries"/>.</summary>
    public int Divisions { get; init; } = DefaultDivisions;

    /// <summary>One step: the band's width over <see cref="Divisions"/>.</summary>
    public double Step => Band.Width / Divisions;

    /// <summary>Where the value stands in the band, 0 at the low end and 1 at the high end (0.5 for a band of no width).</summary>
    public double Position => Band.Width > 0 ? Math.Clamp((Value - Band.Low) / Band.Width, 0, 1) : 0.5;

    /// <summary>Offset of the value from nominal in percent of the nominal value; null when the nominal value is 0.</summary>
    public double? PercentFromNominal => Nominal == 0 ? null : 100.0 * (Value - Nominal) / Math.Abs(Nominal);

    /// <summary>
    /// The next division count of <see cref="DivisionSeries"/>: finer (more steps) or coarser; the same at either end.
    /// </summary>
    public int NextDivisions(bool finer)
    {
        var series = DivisionSeries;
        int at = series.Count(d => d < Divisions);
        int next = finer ? series.FirstOrDefault(d => d > Divisions) : (at > 0 ? series[at - 1] : 0);
        return next == 0 ? Divisions : next;
    }

    /// <summary>The varied parameter <paramref name="parameter"/> at its nominal value.</summary>
    public static VariedPosition AtNominal(Parameter parameter) =>
        new(parameter.Name, parameter.Unit, parameter.Value, parameter.Band ?? new Interval(parameter.Value, parameter.Value), parameter.Value);

    /// <summary>The parameter the plant varies first: the file's <c>vary</c> when toleranced, else the first toleranced one.</summary>
    public static VariedPosition First(Plant plant)
    {
        var candidates = Candidates(plant);
        var chosen = candidates.FirstOrDefault(p => p.Name == plant.Loop.Vary) ?? candidates.FirstOrDefault();
        return chosen is null ? None : AtNominal(chosen);
    }

    /// <summary>The parameters that can be varied: every toleranced one but the swept one, in file order.</summary>
    public static IReadOnlyList<Parameter> Candidates(Plant plant) =>
        plant.TolerancedParameters().Where(p => p.Name != plant.Loop.Sweep).ToList();

    /// <summary>
    /// The next stop above (<paramref name="direction"/> +1) or below (-1) the value: the band split in
    /// <see cref="Divisions"/> steps, and the nominal value; the value itself at the end of the band.
    /// </summary>
    public double Next(int direction)
    {
        double step = Step;
        if (!(step > 0))
        {
            return Value;
        }

        double tolerance = 1e-9 * Band.Width;
        var stops = Enumerable.Range(0, Divisions + 1)
            .Select(i => i == Divisions ? Band.High : StepSeries.Round(Band.Low + (i * step), step / 100))
            .Append(Nominal);
        double? next = direction > 0
            ? stops.Where(v => v > Value + tolerance).Order().Cast<double?>().FirstOrDefault()
            : stops.Where(v => v < Value - tolerance).OrderDescending().Cast<double?>().FirstOrDefault();
        return next ?? Value;
    }
}
