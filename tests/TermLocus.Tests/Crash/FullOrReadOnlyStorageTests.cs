using System.Runtime.Versioning;
using TermLocus.App.Workbench;
using TermLocus.Tests.Cli;

namespace TermLocus.Tests.Crash;

/// <summary>
/// Saving where it cannot be done: a full file system (ENOSPC), a read-only mount (EROFS), a folder or file whose
/// permission bits forbid writing. Each way of writing (the save verb, the workbench's save, its recovery file) must
/// say so in one clear line and leave every file as it was (errno meanings: POSIX write(2), open(2); common practice).
/// </summary>
[UnsupportedOSPlatform("windows")]
public sealed class FullOrReadOnlyStorageTests
{
    private static readonly SaveContext Context = new(() => new DateTimeOffset(2026, 5, 6, 7, 8, 9, TimeSpan.Zero), "tester@bench");

    [TmpfsFact]
    public void A_full_file_system_refuses_every_save_with_a_clear_message_and_loses_nothing()
    {
        using var mount = TmpfsMount.Create(256);
        string plant = CopyPlant(mount.Path);
        var before = File.ReadAllBytes(plant);
        var loaded = Load(plant);
        mount.Fill();

        var (code, stdout, stderr) = CliRunner.Run("save", plant, "--set", "Kp=7");
        var saveFailed = Assert.IsType<OperatingPointSaveFailed>(Worker().Perform(new SaveOperatingPointEffect(loaded, 7, "v", false)));
        var recoveryFailed = Assert.IsType<OperatingPointSaveFailed>(Worker().Perform(new SaveRecoveryEffect(loaded, 7, "v")));

        Assert.Equal(2, code);
        Assert.Equal("", stdout);
        Assert.Equal($"{plant}: error: could not save {plant}: No space left on device", stderr[..stderr.IndexOf(" : ", StringComparison.Ordinal)]);
        Assert.EndsWith("; the file is unchanged" + Environment.NewLine, stderr, StringComparison.Ordinal);
        Assert.StartsWith($"could not save {plant}: No space left on device", saveFailed.Problem, StringComparison.Ordinal);
        Assert.StartsWith($"recovery file not written: could not save {plant}.recovery: No space left on device", recoveryFailed.Problem, StringComparison.Ordinal);
        Assert.Equal(before, File.ReadAllBytes(plant));
        Assert.Equal(["filler", "plant.toml"], Directory.GetFiles(mount.Path).Select(Path.GetFileName).Order(StringComparer.Ordinal));

        // Nothing was lost on the way: with room again, the same save goes through.
        File.Delete(mount.File("filler"));
        var saved = Assert.IsType<OperatingPointSaved>(Worker().Perform(new SaveOperatingPointEffect(loaded, 7, "v", false)));
        Assert.Equal(7.0, saved.Plant.SweptParameter.Value, 0.0);
    }

    [TmpfsFact]
    public void A_read_only_file_system_refuses_every_save_with_a_clear_message()
    {
        using var mount = TmpfsMount.Create(256);
        string plant = CopyPlant(mount.Path);
        var before = File.ReadAllBytes(plant);
        var loaded = Load(plant);
        mount.RemountReadOnly();

        var (code, _, stderr) = CliRunner.Run("save", plant, "--set", "Kp=7");
        var saveFailed = Assert.IsType<OperatingPointSaveFailed>(Worker().Perform(new SaveOperatingPointEffect(loaded, 7, "v", false)));
        var recoveryFailed = Assert.IsType<OperatingPointSaveFailed>(Worker().Perform(new SaveRecoveryEffect(loaded, 7, "v")));

        Assert.Equal(2, code);
        Assert.StartsWith($"{plant}: error: cannot open {plant} for writing: Read-only file system", stderr, StringComparison.Ordinal);
        Assert.StartsWith($"cannot open {plant} for writing: Read-only file system", saveFailed.Problem, StringComparison.Ordinal);
        Assert.StartsWith("recovery file not written: ", recoveryFailed.Problem, StringComparison.Ordinal);
        Assert.Contains("Read-only file system", recoveryFailed.Problem, StringComparison.Ordinal);
        Assert.Equal(before, File.ReadAllBytes(plant));
        Assert.Equal(["plant.toml"], Directory.GetFiles(mount.Path).Select(Path.GetFileName));
    }

    [UnixFact]
    public void A_folder_marked_read_only_refuses_the_save_and_the_recovery_file_with_a_clear_message()
    {
        using var folder = new CrashFolder();
        string plant = CopyPlant(folder.Library);
        var before = File.ReadAllBytes(plant);
        var loaded = Load(plant);
        File.SetUnixFileMode(folder.Library, UnixFileMode.UserRead | UnixFileMode.UserExecute);

        var (code, _, stderr) = CliRunner.Run("save", plant, "--set", "Kp=7");
        var recoveryFailed = Assert.IsType<OperatingPointSaveFailed>(Worker().Perform(new SaveRecoveryEffect(loaded, 7, "v")));

        Assert.Equal(2, code);
        Assert.Equal($"{plant}: error: the folder {folder.Library} is read-only, and saving writes a new copy beside plant.toml; make the folder writable or save elsewhere{Environment.NewLine}", stderr);
        Assert.Equal($"recovery file not written: the folder {folder.Library} is read-only, and saving writes a new copy beside plant.toml.recovery; make the folder writable or save elsewhere", recoveryFailed.Problem);
        Assert.Equal(before, File.ReadAllBytes(plant));
        Assert.Equal(["plant.toml"], Directory.GetFiles(folder.Library).Select(Path.GetFileName));
    }

    [UnixFact]
    public void A_plant_file_marked_read_only_is_not_saved_into_but_its_recovery_file_is_written()
    {
        using var folder = new CrashFolder();
        string plant = CopyPlant(folder.Library);
        File.SetUnixFileMode(plant, UnixFileMode.UserRead | UnixFileMode.GroupRead);
        var before = File.ReadAllBytes(plant);
        var loaded = Load(plant);

        var (code, _, stderr) = CliRunner.Run("save", plant, "--set", "Kp=7");
        var recovery = Worker().Perform(new SaveRecoveryEffect(loaded, 7, "v"));

        Assert.Equal(2, code);
        Assert.Equal($"{plant}: error: {plant} is read-only (mode 440); make it writable (chmod u+w) or save under another name{Environment.NewLine}", stderr);
        Assert.Equal(before, File.ReadAllBytes(plant));
        // The value is not lost: the recovery file holds it, with the plant's permission bits.
        Assert.Null(recovery);
        Assert.Contains("Kp    = { value = 7.0,", File.ReadAllText(plant + ".recovery"), StringComparison.Ordinal);
        Assert.Equal(UnixFileMode.UserRead | UnixFileMode.GroupRead, File.GetUnixFileMode(plant + ".recovery"));
    }

    private static string CopyPlant(string folder)
    {
        string plant = Path.Combine(folder, "plant.toml");
        File.Copy(RepoFiles.Plant("conveyor-speed.toml"), plant);
        return plant;
    }

    private static LoadedPlant Load(string plant) => Assert.IsType<PlantLoaded>(Worker().Perform(new LoadPlantEffect(plant))).Loaded;

    private static EffectWorker Worker() => new(Context);
}
