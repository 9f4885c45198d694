using System.Collections.Immutable;

namespace TermLocus.App.Workbench;

/// <summary>The folder of plant files and what is known about each.</summary>
/// <param name="Folder">The library folder, or null when none exists.</param>
/// <param name="Items">The files, sorted by file name; empty until scanned.</param>
/// <param name="Scanned">True once a scan has come back.</param>
public sealed record LibraryState(string? Folder, ImmutableArray<LibraryItem> Items, bool Scanned)
{
    /// <summary>A library not scanned yet.</summary>
    public static LibraryState Unscanned(string? folder) => new(folder, [], false);
}
