namespace TermLocus.Tests.Cli;

/// <summary>A workbench recovery file (<c>plant.toml.recovery</c>) beside a plant does not confuse the verbs.</summary>
public sealed class RecoveryFileVerbTests : IDisposable
{
    private readonly string folder = Path.Combine(Path.GetTempPath(), "termlocus-verbs-" + Guid.NewGuid().ToString("N"));

    public RecoveryFileVerbTests()
    {
        Directory.CreateDirectory(folder);
        string text = File.ReadAllText(RepoFiles.Plant("press-cylinder-position.toml"));
        File.WriteAllText(Plant, text);
        // What the workbench leaves after a signal: the plant with another value and one more operating point.
        File.WriteAllText(Plant + ".recovery", text.Replace("value = 30.0", "value = 36.0", StringComparison.Ordinal));
    }

    private string Plant => Path.Combine(folder, "press.toml");

    public void Dispose() => Directory.Delete(folder, recursive: true);

    [Fact]
    public void Check_of_a_folder_checks_the_plant_and_not_its_recovery_file()
    {
        var (code, stdout, stderr) = CliRunner.Run("check", folder);
        Assert.True(code is 0 or 1, stderr);
        Assert.Contains("press.toml", stdout, StringComparison.Ordinal);
        Assert.DoesNotContain(".recovery", stdout + stderr, StringComparison.Ordinal);
        Assert.Contains("Kp = 30 ", stdout, StringComparison.Ordinal);
        Assert.DoesNotContain("Kp = 36", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void Save_writes_the_plant_and_leaves_the_recovery_file_alone()
    {
        string recovery = File.ReadAllText(Plant + ".recovery");
        var (code, stdout, stderr) = CliRunner.Run("save", Plant, "--set", "Kp=20");
        Assert.True(code is 0 or 1, stderr);
        Assert.Contains("saved Kp = 20", stdout, StringComparison.Ordinal);
        Assert.Contains("value = 20.0", File.ReadAllText(Plant), StringComparison.Ordinal);
        Assert.Equal(recovery, File.ReadAllText(Plant + ".recovery"));
    }
}
