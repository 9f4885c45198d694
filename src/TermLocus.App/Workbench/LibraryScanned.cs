using System.Collections.Immutable;

namespace TermLocus.App.Workbench;

/// <summary>The library folder was listed and each file checked.</summary>
/// <param name="Folder">The folder.</param>
/// <param name="Items">Its plant files, sorted by file name.</param>
public sealed record LibraryScanned(string Folder, ImmutableArray<LibraryItem> Items) : Message;
