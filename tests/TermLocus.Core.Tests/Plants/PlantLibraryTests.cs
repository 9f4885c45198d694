using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Plants;

public sealed class PlantLibraryTests : IDisposable
{
    private const string Valid = "title = \"{0}\"\n[parameters]\nK = {{ value = 1, range = [0, 5] }}\n[loop]\nplant = \"K/s\"\nsweep = \"K\"\n";

    private readonly TemporaryFolder folder = new();

    public void Dispose() => folder.Dispose();

    [Fact]
    public void Every_toml_file_is_listed_in_name_order_with_its_title_or_its_error()
    {
        File.WriteAllText(folder.File("b.toml"), string.Format(System.Globalization.CultureInfo.InvariantCulture, Valid, "Bench B"));
        File.WriteAllText(folder.File("a.toml"), "title = \"Broken A\"\n[loop]\nsweep = \"K\"\n");
        File.WriteAllText(folder.File("C.TOML"), "not toml at all = = =\n");
        File.WriteAllText(folder.File("notes.txt"), "ignored");
        File.WriteAllText(folder.File(".hidden.toml"), "ignored");
        Directory.CreateDirectory(folder.File("sub.toml"));

        var entries = PlantLibrary.Scan(folder.Path);

        Assert.Equal(["C.TOML", "a.toml", "b.toml"], entries.Select(e => e.FileName));
        Assert.Equal(["C", "Broken A", "Bench B"], entries.Select(e => e.Title));
        Assert.Equal([false, false, true], entries.Select(e => e.IsValid));
        Assert.Equal("[loop] needs 'plant' (with optional 'controller' and 'sensor') or 'characteristic'", entries[1].Error!.Message);
        Assert.Equal(new SourcePosition(1, 5), entries[0].Error!.Position); // "not toml": the second word is unexpected
        Assert.Equal("Bench B", entries[2].Plant!.Title);
    }

    [Fact]
    public void The_demo_library_lists_without_errors()
    {
        var entries = PlantLibrary.Scan(Path.Combine(AppContext.BaseDirectory, "DemoPlants"));

        Assert.True(entries.Length >= 5);
        Assert.All(entries, e => Assert.Null(e.Error));
    }

    [Fact]
    public void A_missing_folder_is_reported_not_thrown_by_try_scan()
    {
        var missing = folder.File("nope");

        Assert.False(PlantLibrary.TryScan(missing, out var entries, out var error));

        Assert.Empty(entries);
        Assert.Equal($"{missing}: no such folder", error);
    }
}
