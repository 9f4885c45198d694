namespace TermLocus.App.Workbench;

/// <summary>A plant file could not be read or its loop not built.</summary>
/// <param name="Path">The file.</param>
/// <param name="Problem">The located error line (<c>FILE:LINE:COL: error: ...</c>), untrusted text.</param>
public sealed record PlantLoadFailed(string Path, string Problem) : Message;
