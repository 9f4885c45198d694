using TermLocus.Tui;

namespace TermLocus.Tests.Tui;

public sealed class LibraryLocatorTests : IDisposable
{
    private readonly string root = Path.Combine(Path.GetTempPath(), "termlocus-locator-" + Guid.NewGuid().ToString("N"));

    public LibraryLocatorTests()
    {
        Directory.CreateDirectory(Path.Combine(root, "work", "plants"));
        Directory.CreateDirectory(Path.Combine(root, "bin", "plants"));
        Directory.CreateDirectory(Path.Combine(root, "empty"));
        File.WriteAllText(Path.Combine(root, "work", "plants", "a.toml"), "title = \"a\"\n");
    }

    public void Dispose() => Directory.Delete(root, recursive: true);

    [Fact]
    public void A_file_opens_with_its_folder_as_the_library()
    {
        var (file, folder, problem) = LibraryLocator.Resolve("plants/a.toml", Path.Combine(root, "work"), Path.Combine(root, "bin"));
        Assert.Equal(Path.Combine(root, "work", "plants", "a.toml"), file);
        Assert.Equal(Path.Combine(root, "work", "plants"), folder);
        Assert.Null(problem);
    }

    [Fact]
    public void A_folder_opens_as_the_library()
    {
        var (file, folder, _) = LibraryLocator.Resolve(Path.Combine(root, "bin", "plants"), root, root);
        Assert.Null(file);
        Assert.Equal(Path.Combine(root, "bin", "plants"), folder);
    }

    [Fact]
    public void Without_a_path_the_local_plants_folder_wins_over_the_shipped_one()
    {
        Assert.Equal(Path.Combine(root, "work", "plants"), LibraryLocator.Resolve(null, Path.Combine(root, "work"), Path.Combine(root, "bin")).Folder);
        Assert.Equal(Path.Combine(root, "bin", "plants"), LibraryLocator.Resolve(null, Path.Combine(root, "empty"), Path.Combine(root, "bin")).Folder);
    }

    [Fact]
    public void Nothing_to_open_is_a_plain_problem()
    {
        Assert.Equal("nope.toml: no such file or folder", LibraryLocator.Resolve("nope.toml", root, root).Problem);
        Assert.NotNull(LibraryLocator.Resolve(null, Path.Combine(root, "empty"), Path.Combine(root, "empty")).Problem);
    }
}
