using System.Globalization;

namespace TermLocus.App.Workbench;

/// <summary>File names for a save under another name: <c>name.2.toml</c> beside <c>name.toml</c>, the first one free.</summary>
public static class SaveAsNames
{
    /// <summary>The highest number tried.</summary>
    public const int MaxNumber = 99;

    private const string Extension = ".toml";

    /// <summary>
    /// The first of <c>stem.2.toml</c>, <c>stem.3.toml</c>, … beside <paramref name="plantPath"/> (in the same spelling:
    /// relative stays relative) that <paramref name="exists"/> says is free; a plant already named <c>stem.N.toml</c>
    /// goes on from N + 1. When every number up to <see cref="MaxNumber"/> is taken, the first is returned anyway (the
    /// save refuses it and the user types a name).
    /// </summary>
    public static string Suggest(string plantPath, Func<string, bool> exists)
    {
        ArgumentNullException.ThrowIfNull(plantPath);
        ArgumentNullException.ThrowIfNull(exists);
        string folder = Path.GetDirectoryName(plantPath) ?? string.Empty;
        string file = Path.GetFileName(plantPath);
        string stem = IsPlantFileName(file) ? file[..^Extension.Length] : file;
        int first = 2;
        int dot = stem.LastIndexOf('.');
        if (dot > 0 && int.TryParse(stem.AsSpan(dot + 1), NumberStyles.None, CultureInfo.InvariantCulture, out int n) && n is >= 1 and < MaxNumber)
        {
            stem = stem[..dot];
            first = n + 1;
        }

        string Candidate(int number) => Path.Combine(folder, string.Create(CultureInfo.InvariantCulture, $"{stem}.{number}{Extension}"));
        for (int number = first; number <= MaxNumber; number++)
        {
            if (!exists(Candidate(number)))
            {
                return Candidate(number);
            }
        }

        return Candidate(first);
    }

    /// <summary>True when <paramref name="path"/> ends in <c>.toml</c> (any case), as the library lists plant files.</summary>
    public static bool IsPlantFileName(string path) =>
        path.EndsWith(Extension, StringComparison.OrdinalIgnoreCase) && Path.GetFileName(path).Length > Extension.Length;
}
