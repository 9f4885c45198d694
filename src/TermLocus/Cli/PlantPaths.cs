namespace TermLocus.Cli;

/// <summary>Turns the PATH arguments of a verb into plant files: a folder stands for its *.toml files, sorted.</summary>
internal static class PlantPaths
{
    /// <summary>The files, in argument order (a folder's files by name). A folder without plant files is a usage error.</summary>
    public static IReadOnlyList<string> Expand(IEnumerable<string> paths)
    {
        var files = new List<string>();
        foreach (var path in paths)
        {
            if (!Directory.Exists(path))
            {
                files.Add(path);
                continue;
            }

            var inFolder = Directory.GetFiles(path, "*.toml")
                .Where(f => !Path.GetFileName(f).StartsWith('.'))
                .Order(StringComparer.Ordinal)
                .ToList();
            if (inFolder.Count == 0)
            {
                throw new UsageException($"{path}: no plant files (*.toml) in this folder");
            }

            files.AddRange(inFolder);
        }

        return files;
    }
}
