namespace TermLocus.Core.Analysis;

/// <summary>The plant-file key and the unit of each <see cref="SpecKind"/>.</summary>
public static class SpecKindText
{
    /// <summary>The key as written in a plant file's <c>[specs]</c> table, e.g. <c>min_damping</c>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not a defined <see cref="SpecKind"/>.</exception>
    public static string Key(this SpecKind kind) => kind switch
    {
        SpecKind.MinDamping => "min_damping",
        SpecKind.MinDecayRate => "min_decay_rate",
        SpecKind.MaxTimeToHalf => "max_time_to_half",
        SpecKind.MaxSettlingTime => "max_settling_time",
        SpecKind.MinNaturalFrequency => "min_natural_frequency",
        SpecKind.MaxNaturalFrequency => "max_natural_frequency",
        SpecKind.MaxOvershootPct => "max_overshoot_pct",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "Unknown spec kind."),
    };

    /// <summary>The unit of the limit, the actual value and the margin: "" (dimensionless), "1/s", "s" or "rad/s".</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not a defined <see cref="SpecKind"/>.</exception>
    public static string Unit(this SpecKind kind) => kind switch
    {
        SpecKind.MinDamping => "",
        SpecKind.MinDecayRate => "1/s",
        SpecKind.MaxTimeToHalf or SpecKind.MaxSettlingTime => "s",
        SpecKind.MinNaturalFrequency or SpecKind.MaxNaturalFrequency => "rad/s",
        SpecKind.MaxOvershootPct => "%",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "Unknown spec kind."),
    };

    /// <summary>The kind for a plant-file key of <c>[specs]</c> (exact, lower case); false for any other text.</summary>
    public static bool TryParseKey(string? key, out SpecKind kind)
    {
        SpecKind? parsed = key switch
        {
            "min_damping" => SpecKind.MinDamping,
            "min_decay_rate" => SpecKind.MinDecayRate,
            "max_time_to_half" => SpecKind.MaxTimeToHalf,
            "max_settling_time" => SpecKind.MaxSettlingTime,
            "min_natural_frequency" => SpecKind.MinNaturalFrequency,
            "max_natural_frequency" => SpecKind.MaxNaturalFrequency,
            "max_overshoot_pct" => SpecKind.MaxOvershootPct,
            _ => null,
        };
        kind = parsed.GetValueOrDefault();
        return parsed.HasValue;
    }
}
