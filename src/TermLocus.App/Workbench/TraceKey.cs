using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>
/// What a locus trace depends on: the plant file, its loop as read, and the values of every parameter except the
/// swept one. Stepping or saving the swept value keeps the key, so the trace is reused; reading the file again
/// makes a new key (conservatively: the loop may have changed).
/// </summary>
/// <param name="PlantPath">The plant file.</param>
/// <param name="Loop">The loop definition as read (its expression texts are compared by identity).</param>
/// <param name="OtherValues">The other parameters' values, canonical text (sorted <c>name=R-format</c>, ';'-separated).</param>
public sealed record TraceKey(string PlantPath, LoopDefinition Loop, string OtherValues)
{
    /// <summary>The key for <paramref name="plant"/> with every non-swept parameter at <paramref name="values"/>.</summary>
    public static TraceKey For(Plant plant, IReadOnlyDictionary<string, double> values)
    {
        var parts = values
            .Where(kv => kv.Key != plant.Loop.Sweep)
            .OrderBy(kv => kv.Key, StringComparer.Ordinal)
            .Select(kv => kv.Key + "=" + kv.Value.ToString("R", System.Globalization.CultureInfo.InvariantCulture));
        return new TraceKey(plant.Path, plant.Loop, string.Join(';', parts));
    }
}
