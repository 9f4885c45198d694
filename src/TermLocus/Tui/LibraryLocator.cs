namespace TermLocus.Tui;

/// <summary>
/// Works out what to open from the command line's PATH: a plant file (and its folder as the library), a folder, or
/// by default ./plants when it exists, else the plants folder shipped next to the program.
/// </summary>
internal static class LibraryLocator
{
    /// <summary>The plant file to open (or null) and the library folder (or null when there is none).</summary>
    public static (string? PlantFile, string? Folder, string? Problem) Resolve(string? path, string currentDirectory, string programDirectory)
    {
        if (path is not null)
        {
            string full = Path.GetFullPath(path, currentDirectory);
            if (Directory.Exists(full))
            {
                return (null, full, null);
            }

            if (File.Exists(full))
            {
                return (full, Path.GetDirectoryName(full), null);
            }

            return (null, null, $"{path}: no such file or folder");
        }

        string local = Path.Combine(currentDirectory, "plants");
        if (Directory.Exists(local))
        {
            return (null, local, null);
        }

        string shipped = Path.Combine(programDirectory, "plants");
        return Directory.Exists(shipped)
            ? (null, shipped, null)
            : (null, null, "no plants folder here or next to the program; give a plant file or folder");
    }
}
