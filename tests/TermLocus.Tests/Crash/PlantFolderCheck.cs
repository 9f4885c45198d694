using TermLocus.Core.Plants;

using System.Runtime.Versioning;

namespace TermLocus.Tests.Crash;

/// <summary>What must hold in the plant folder after any kill, whatever the file's version.</summary>
[UnsupportedOSPlatform("windows")]
internal static class PlantFolderCheck
{
    /// <summary>
    /// The problem with <paramref name="folder"/>, or null: <paramref name="file"/> keeps <paramref name="mode"/>, the
    /// library lists exactly <paramref name="plants"/> (a leftover temporary file is never taken for a plant), each
    /// one valid. Leftover temporary files are counted in <paramref name="tempLeft"/> and then removed.
    /// </summary>
    public static string? Problem(string folder, string file, UnixFileMode mode, string[] plants, out bool tempLeft)
    {
        var temps = Directory.GetFiles(folder, ".*.tmp");
        tempLeft = temps.Length > 0;
        string? problem = null;
        if (File.Exists(file) && File.GetUnixFileMode(file) is var actual && actual != mode)
        {
            problem = $"{Path.GetFileName(file)} has mode {Octal(actual)}, not {Octal(mode)}";
        }

        var listed = PlantLibrary.Scan(folder);
        if (!listed.Select(e => e.FileName).SequenceEqual(plants) || listed.Any(e => e.Plant is null))
        {
            problem ??= $"the library lists [{string.Join(", ", listed.Select(e => e.FileName + (e.Error is null ? "" : " (broken)")))}] " +
                $"with [{string.Join(", ", Directory.GetFiles(folder).Select(Path.GetFileName))}] in the folder";
        }

        foreach (var temp in temps)
        {
            File.Delete(temp);
        }

        return problem;
    }

    public static string Octal(UnixFileMode mode) => Convert.ToString((int)mode, 8);
}
