using Tomlyn.Syntax;

namespace TermLocus.Core.Plants;

/// <summary>Reads <c>[specs]</c>: optional limits on the closed-loop poles, each range-checked.</summary>
internal static class SpecsTableReader
{
    private static readonly string[] SpecKeys =
    [
        "min_damping", "min_decay_rate", "max_time_to_half", "max_settling_time",
        "min_natural_frequency", "max_natural_frequency", "max_overshoot_pct",
    ];

    /// <summary>
    /// Shortest time limit accepted, s. Each time limit T becomes a decay rate ln2/T or 4/T; below about 2e-308 that
    /// overflows to infinity, which would reach the screen as the required decay rate.
    /// </summary>
    public const double MinTimeLimitSeconds = 1e-300;

    /// <summary>The specs; <see cref="Specs.None"/> when the table is absent.</summary>
    public static Specs Read(PlantSyntaxContext context, TableSyntaxBase? table)
    {
        if (table?.Items is null)
        {
            return Specs.None;
        }

        var items = KeyedItems.Collect(context, table.Items, "[specs]", SpecKeys);
        double? Get(string key, Func<double, bool> valid, string expected) =>
            items.Find(key) is { } item ? LoopTableReader.Limited(context, item, key, valid, expected) : null;

        var specs = new Specs(
            MinDamping: Get("min_damping", x => x > -1 && x <= 1, "more than -1 and at most 1"),
            MinDecayRate: Get("min_decay_rate", x => x >= 0, "0 or more (1/s)"),
            MaxTimeToHalfSeconds: Get("max_time_to_half", x => x >= MinTimeLimitSeconds, "more than 0 seconds (at least 1e-300 s)"),
            MaxSettlingTimeSeconds: Get("max_settling_time", x => x >= MinTimeLimitSeconds, "more than 0 seconds (at least 1e-300 s)"),
            MinNaturalFrequency: Get("min_natural_frequency", x => x >= 0, "0 or more (rad/s)"),
            MaxNaturalFrequency: Get("max_natural_frequency", x => x > 0, "more than 0 (rad/s)"),
            MaxOvershootPct: Get("max_overshoot_pct", x => x >= 0, "0 or more percent"));
        if (specs.MinNaturalFrequency > specs.MaxNaturalFrequency)
        {
            throw context.Fail(items.Find("min_natural_frequency")!.Value!, $"'min_natural_frequency' {PlantSyntaxContext.Show(specs.MinNaturalFrequency.Value)} is above 'max_natural_frequency' {PlantSyntaxContext.Show(specs.MaxNaturalFrequency!.Value)}");
        }

        return specs;
    }
}
