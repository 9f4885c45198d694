namespace TermLocus.App.Workbench;

/// <summary>
/// Where the toleranced ("varied") parameter stands in its band. Only the nominal value is used so far; stepping
/// through the band by keystroke comes later and will fill this in.
/// </summary>
/// <param name="Parameter">The varied parameter's name, or null when the plant has none.</param>
/// <param name="Corner">-1 at the low end of the band, 0 at the nominal value, +1 at the high end.</param>
public sealed record VariedPosition(string? Parameter, int Corner)
{
    /// <summary>The nominal value of every parameter.</summary>
    public static VariedPosition Nominal { get; } = new(null, 0);
}
