namespace TermLocus.App.Workbench;

/// <summary>The terminal layer saw the plant file written, replaced, moved or deleted (by anyone, us included).</summary>
/// <param name="Path">The plant file.</param>
public sealed record PlantFileTouched(string Path) : Message;
