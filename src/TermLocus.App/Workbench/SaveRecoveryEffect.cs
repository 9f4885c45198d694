namespace TermLocus.App.Workbench;

/// <summary>
/// On an abrupt exit, write what saving would have written to <c>&lt;plant file&gt;.recovery</c> beside the plant
/// file, leaving the plant file itself alone. No answer unless it fails: the program is on its way out.
/// </summary>
/// <param name="Loaded">The plant as read (with the file's bytes).</param>
/// <param name="Value">The unsaved swept value.</param>
/// <param name="Verdict">One line saying how the value fares against the specs across the band, or null to have
/// the band checked while writing.</param>
public sealed record SaveRecoveryEffect(LoadedPlant Loaded, double Value, string? Verdict) : Effect
{
    /// <summary>
    /// The note of the operating-point record in a recovery file: should the file be renamed into place, its record
    /// still says it is no saved decision.
    /// </summary>
    public const string RecordNote = "recovered after the workbench was ended before saving; not a saved decision";

    /// <summary>The name of the record in a recovery file, e.g. "Kp = 28.5926 (recovered, not saved)".</summary>
    public static string RecordName(string parameter, double value) =>
        $"{parameter} = {Text.NumberText.Exact(value)} (recovered, not saved)";

    /// <summary>The recovery file for <paramref name="plantPath"/>.</summary>
    public static string RecoveryPathFor(string plantPath) => plantPath + ".recovery";
}
