using System.Collections.Immutable;

namespace TermLocus.App.Workbench;

/// <summary>The library folder was listed and each file checked.</summary>
/// <param name="Folder">The folder.</param>
/// <param name="Items">Its plant files, sorted by file name.</param>
/// <param name="Problem">Why the folder could not be listed (then Items is empty), or null.</param>
public sealed record LibraryScanned(string Folder, ImmutableArray<LibraryItem> Items, string? Problem = null) : Message;
