namespace TermLocus.App.Workbench;

/// <summary>
/// Write the swept value into the plant file as its value and as a new operating point, atomically, refusing when
/// the file changed on disk since it was read or is gone; or write the same under another name. Answers
/// <see cref="OperatingPointSaved"/>, <see cref="SaveRefused"/> (a choice is needed) or
/// <see cref="OperatingPointSaveFailed"/>.
/// </summary>
/// <param name="Loaded">The plant as read (with the file's bytes and hash).</param>
/// <param name="Value">The swept value to save.</param>
/// <param name="Verdict">One line saying how the value fares against the specs across the band, or null to have the
/// save run the band check itself.</param>
/// <param name="QuitAfter">Quit once saved (the answer to the quit question).</param>
/// <param name="Name">The operating point's name, or null for "name = value".</param>
/// <param name="Note">Its note, or null for the default note.</param>
public sealed record SaveOperatingPointEffect(
    LoadedPlant Loaded, double Value, string? Verdict, bool QuitAfter, string? Name = null, string? Note = null) : Effect
{
    /// <summary>Where the save writes.</summary>
    public SaveMode Mode { get; init; } = SaveMode.IntoPlantFile;

    /// <summary>For <see cref="SaveMode.NewFile"/>: the file to create; else null (the plant file).</summary>
    public string? TargetPath { get; init; }
}
