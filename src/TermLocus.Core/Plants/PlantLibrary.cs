using System.Collections.Immutable;
using Tomlyn.Parsing;
using Tomlyn.Syntax;

namespace TermLocus.Core.Plants;

/// <summary>
/// Lists the plant files of a folder: every <c>*.toml</c> file directly in it (any case of the extension; hidden files
/// whose names start with a dot are left out), sorted by file name (ordinal), each loaded and validated. A broken file
/// is listed with its located error, never skipped.
/// </summary>
public static class PlantLibrary
{
    /// <summary>The plant files of <paramref name="folder"/>, sorted by file name.</summary>
    /// <exception cref="DirectoryNotFoundException">The folder does not exist.</exception>
    /// <exception cref="UnauthorizedAccessException">The folder cannot be listed.</exception>
    /// <exception cref="IOException">Another I/O error while listing the folder.</exception>
    public static ImmutableArray<PlantLibraryEntry> Scan(string folder)
    {
        ArgumentNullException.ThrowIfNull(folder);
        var options = new EnumerationOptions { MatchCasing = MatchCasing.CaseInsensitive, RecurseSubdirectories = false, AttributesToSkip = 0 };
        var files = Directory.EnumerateFiles(folder, "*.toml", options)
            .Where(f => !System.IO.Path.GetFileName(f).StartsWith('.'))
            .Order(StringComparer.Ordinal)
            .ToArray();

        // Files are independent and parsing dominates, so load them on every core; the order is kept.
        return [.. files.AsParallel().AsOrdered().Select(Load)];
    }

    /// <summary>Like <see cref="Scan"/>, but returns false with a one-line reason when the folder cannot be listed.</summary>
    public static bool TryScan(string folder, out ImmutableArray<PlantLibraryEntry> entries, out string? error)
    {
        try
        {
            entries = Scan(folder);
            error = null;
            return true;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException)
        {
            entries = [];
            error = e is DirectoryNotFoundException ? $"{folder}: no such folder" : $"{folder}: cannot list the folder: {PlantTextSafety.Visible(e.Message, 200)}";
            return false;
        }
    }

    /// <summary>Loads one file as a library entry; a broken file gives an entry with its error.</summary>
    public static PlantLibraryEntry Load(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        var name = System.IO.Path.GetFileName(path);
        try
        {
            var plant = PlantFileReader.Read(path);
            return new PlantLibraryEntry(name, path, plant.Title, plant, null);
        }
        catch (PlantFileException e)
        {
            return new PlantLibraryEntry(name, path, TitleOfBrokenFile(path), null, e.Error);
        }
    }

    // A broken file may still have a readable title; it helps the user recognise the file in the list.
    private static string TitleOfBrokenFile(string path)
    {
        var stem = System.IO.Path.GetFileNameWithoutExtension(path);
        try
        {
            var (text, _) = PlantFileBytes.Decode(PlantFileBytes.ReadBounded(path), path);
            var document = SyntaxParser.Parse(text.TrimStart('\uFEFF'), path, validate: false);
            foreach (var item in document.KeyValues)
            {
                if (item.Key is { } key && !TomlKeys.IsDotted(key) && TomlKeys.PartName(key.Key) == "title" && item.Value is StringValueSyntax { Value: { Length: > 0 } title })
                {
                    return title;
                }
            }
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            // Unreadable, not UTF-8 or not TOML: the file name is all there is.
        }

        return stem;
    }
}
