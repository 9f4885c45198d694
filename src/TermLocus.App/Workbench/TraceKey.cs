using System.Globalization;
using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>
/// What a locus trace depends on: the plant file, the text of its loop, and the values of every parameter except the
/// swept one. Stepping or saving the swept value keeps the key, so the trace is reused; a changed loop or another
/// value of any other parameter makes a new key.
/// </summary>
/// <param name="PlantPath">The plant file.</param>
/// <param name="Loop">The loop definition's expressions and settings as canonical text.</param>
/// <param name="OtherValues">The other parameters' values, canonical text (sorted <c>name=R-format</c>, ';'-separated).</param>
public sealed record TraceKey(string PlantPath, string Loop, string OtherValues)
{
    /// <summary>The key for <paramref name="plant"/> with every non-swept parameter at <paramref name="values"/>.</summary>
    public static TraceKey For(Plant plant, IReadOnlyDictionary<string, double> values)
    {
        var parts = values
            .Where(kv => kv.Key != plant.Loop.Sweep)
            .OrderBy(kv => kv.Key, StringComparer.Ordinal)
            .Select(kv => kv.Key + "=" + kv.Value.ToString("R", CultureInfo.InvariantCulture));
        return new TraceKey(plant.Path, LoopText(plant.Loop), string.Join(';', parts));
    }

    private static string LoopText(LoopDefinition loop) => string.Join(
        '\u001f',
        loop.Plant?.Text,
        loop.Controller?.Text,
        loop.Sensor?.Text,
        loop.Feedback,
        loop.Characteristic?.Text,
        loop.Sweep,
        loop.Vary,
        loop.DelaySeconds?.ToString("R", CultureInfo.InvariantCulture),
        loop.SampleTimeSeconds?.ToString("R", CultureInfo.InvariantCulture));
}
