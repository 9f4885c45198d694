namespace TermLocus.Tests.Cli;

/// <summary>Paths inside the repository, found by walking up from the test binary to TermLocus.sln.</summary>
internal static class RepoFiles
{
    public static string Root { get; } = FindRoot();

    public static string Plants => Path.Combine(Root, "plants");

    public static string Plant(string name) => Path.Combine(Plants, name);

    public static string TempPlant(string text)
    {
        string dir = Path.Combine(Path.GetTempPath(), "termlocus-tests-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        string path = Path.Combine(dir, "plant.toml");
        File.WriteAllText(path, text);
        return path;
    }

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "TermLocus.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException("TermLocus.sln not found above the test binary.");
    }
}
