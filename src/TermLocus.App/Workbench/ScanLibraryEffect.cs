namespace TermLocus.App.Workbench;

/// <summary>List and check the plant files of a folder; answers <see cref="LibraryScanned"/>.</summary>
/// <param name="Folder">The folder.</param>
public sealed record ScanLibraryEffect(string Folder) : Effect;
