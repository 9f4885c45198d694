using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Plants;

/// <summary>The bundled demo library in plants/ (copied to DemoPlants/ in the test output).</summary>
public sealed class DemoPlantTests
{
    private static readonly string Folder = Path.Combine(AppContext.BaseDirectory, "DemoPlants");

    public static TheoryData<string> DemoFiles()
    {
        var data = new TheoryData<string>();
        foreach (var file in Directory.GetFiles(Folder, "*.toml").Order(StringComparer.Ordinal))
        {
            data.Add(Path.GetFileName(file));
        }

        return data;
    }

    [Fact]
    public void The_library_has_at_least_five_plants()
    {
        Assert.True(Directory.GetFiles(Folder, "*.toml").Length >= 5);
    }

    [Theory]
    [MemberData(nameof(DemoFiles))]
    public void Each_demo_plant_reads_and_is_complete(string name)
    {
        var path = Path.Combine(Folder, name);

        var plant = PlantFileReader.Read(path);

        Assert.StartsWith("# Invented example", File.ReadAllLines(path)[0], StringComparison.Ordinal);
        Assert.False(string.IsNullOrWhiteSpace(plant.Title));
        Assert.False(string.IsNullOrWhiteSpace(plant.Note));
        Assert.NotEqual(Specs.None, plant.Specs);
        Assert.NotNull(plant.Loop.Vary);
        Assert.NotNull(plant.FindParameter(plant.Loop.Vary!)!.Band);
        Assert.NotNull(plant.SweptParameter.Range);
        Assert.True(plant.SweptParameter.Range!.Value.Contains(plant.SweptParameter.Value));
        Assert.Contains(plant.Parameters, p => p.Unit.Length > 0);
        Assert.Contains(plant.Parameters, p => p.Note.Length > 0);
    }

    // The reader skips Tomlyn's own validation pass; Tomlyn (an independent TOML implementation) must agree that
    // every file the reader accepts is valid TOML.
    [Theory]
    [MemberData(nameof(DemoFiles))]
    public void Tomlyn_validation_agrees_that_each_demo_plant_is_valid_toml(string name)
    {
        var document = Tomlyn.Parsing.SyntaxParser.Parse(File.ReadAllText(Path.Combine(Folder, name)), name, validate: true);

        Assert.False(document.HasErrors, document.Diagnostics.ToString());
    }

    [Fact]
    public void The_library_covers_a_given_characteristic_and_a_swept_physical_coefficient()
    {
        var plants = Directory.GetFiles(Folder, "*.toml").Select(PlantFileReader.Read).ToList();

        Assert.Contains(plants, p => p.Loop.Characteristic is not null);
        Assert.Contains(plants, p => p.Loop.Controller?.Text.Contains("/ s", StringComparison.Ordinal) == true);
        Assert.Contains(plants, p => p.Loop.Sensor?.Text.Contains(p.Loop.Sweep, StringComparison.Ordinal) == true);
        Assert.Contains(plants, p => p.Note.Contains("FAILS ITS SPECS", StringComparison.Ordinal));
    }
}
