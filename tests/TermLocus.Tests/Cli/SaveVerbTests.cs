using TermLocus.Core.Plants;

namespace TermLocus.Tests.Cli;

public class SaveVerbTests
{
    [Fact]
    public void Save_sets_the_swept_value_in_place_and_appends_one_record_leaving_the_rest_byte_identical()
    {
        string original = File.ReadAllText(RepoFiles.Plant("press-cylinder-position.toml"));
        string file = RepoFiles.TempPlant(original);
        var (code, stdout, stderr) = CliRunner.Run("save", file, "--set", "Kp=20", "--name", "bench trial", "--note", "cold oil");
        Assert.True(code is 0 or 1, stderr);
        Assert.Contains("saved Kp = 20", stdout, StringComparison.Ordinal);
        string saved = File.ReadAllText(file);
        var plant = PlantFileReader.Parse(saved, file);
        Assert.Equal(20.0, plant.SweptParameter.Value);
        var point = Assert.Single(plant.OperatingPoints);
        Assert.Equal("bench trial", point.Name);
        Assert.Equal("cold oil", point.Note);
        Assert.Equal(20.0, point.Values["Kp"]);
        Assert.False(string.IsNullOrEmpty(point.Verdict));
        // Outside the changed value and the appended record, nothing moved.
        int changed = original.IndexOf("value = 30.0", StringComparison.Ordinal);
        Assert.Equal(original[..changed], saved[..changed]);
        Assert.StartsWith(original[(changed + "value = 30.0".Length)..].TrimEnd(), saved[(changed + "value = 20.0".Length)..], StringComparison.Ordinal);
    }

    [Fact]
    public void Save_refuses_to_record_a_parameter_other_than_the_swept_one()
    {
        string file = RepoFiles.TempPlant(File.ReadAllText(RepoFiles.Plant("press-cylinder-position.toml")));
        string before = File.ReadAllText(file);
        var (code, stdout, _) = CliRunner.Run("save", file, "--set", "zh=0.2");
        Assert.Equal(2, code);
        Assert.Equal("", stdout);
        Assert.Equal(before, File.ReadAllText(file));
    }
}
