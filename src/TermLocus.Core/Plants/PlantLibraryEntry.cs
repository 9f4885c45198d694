namespace TermLocus.Core.Plants;

/// <summary>One plant file in a library folder: its title and either the loaded plant or why it cannot be loaded.</summary>
/// <param name="FileName">The file's name within the folder (e.g. <c>conveyor-speed.toml</c>).</param>
/// <param name="Path">The file's full path.</param>
/// <param name="Title">The file's <c>title</c>, or its name without extension when it has none or the title cannot
/// be read; untrusted text (sanitise before printing).</param>
/// <param name="Plant">The validated plant, or null when the file is broken.</param>
/// <param name="Error">Why the file cannot be loaded, or null when it loads.</param>
public sealed record PlantLibraryEntry(string FileName, string Path, string Title, Plant? Plant, PlantFileError? Error)
{
    /// <summary>True when the file loaded (<see cref="Plant"/> is set and <see cref="Error"/> is null).</summary>
    public bool IsValid => Plant is not null;
}
