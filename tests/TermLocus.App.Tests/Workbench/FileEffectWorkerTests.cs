using System.Runtime.CompilerServices;
using TermLocus.App.Workbench;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Workbench;

/// <summary>
/// The worker's file effects on real files in a temporary folder: saving when the plant changed on disk or is gone,
/// saving under another name, comparing the file on disk, and the recovery file beside a plant.
/// </summary>
public sealed class FileEffectWorkerTests : IDisposable
{
    private static readonly DateTimeOffset SavedAt = new(2026, 3, 4, 5, 6, 7, TimeSpan.Zero);
    private readonly string folder = Path.Combine(Path.GetTempPath(), "termlocus-files-" + Guid.NewGuid().ToString("N"));
    private readonly EffectWorker worker = new(new SaveContext(() => SavedAt, "tester@bench"));

    public FileEffectWorkerTests()
    {
        Directory.CreateDirectory(folder);
        File.Copy(Path.Combine(DemoPlants(), "conveyor-speed.toml"), Conveyor);
    }

    private string Conveyor => Path.Combine(folder, "conveyor-speed.toml");

    private string Recovery => Conveyor + ".recovery";

    public void Dispose() => Directory.Delete(folder, recursive: true);

    [Fact]
    public void A_save_into_a_file_changed_on_disk_is_refused_with_a_free_name_offered()
    {
        var loaded = Load();
        File.AppendAllText(Conveyor, "# edited by someone else\n");
        File.WriteAllText(Path.Combine(folder, "conveyor-speed.2.toml"), "taken");
        string edited = File.ReadAllText(Conveyor);
        var refused = Assert.IsType<SaveRefused>(worker.Perform(Save(loaded, 8)));
        Assert.Equal(SaveRefusal.FileChanged, refused.Reason);
        Assert.Equal(Path.Combine(folder, "conveyor-speed.3.toml"), refused.SuggestedPath);
        Assert.Equal(edited, File.ReadAllText(Conveyor));
    }

    [Fact]
    public void A_save_into_a_file_that_is_gone_is_refused_and_nothing_is_created()
    {
        var loaded = Load();
        File.Delete(Conveyor);
        var refused = Assert.IsType<SaveRefused>(worker.Perform(Save(loaded, 8)));
        Assert.Equal(SaveRefusal.FileMissing, refused.Reason);
        Assert.Contains("no longer exists", refused.Problem, StringComparison.Ordinal);
        Assert.False(File.Exists(Conveyor));
    }

    [Fact]
    public void Saved_under_another_name_the_new_file_is_the_loaded_one_plus_the_edit_and_the_old_is_untouched()
    {
        var loaded = Load();
        File.AppendAllText(Conveyor, "# edited by someone else\n");
        string edited = File.ReadAllText(Conveyor);
        string target = Path.Combine(folder, "conveyor-speed.2.toml");
        var save = Save(loaded, 8) with { Mode = SaveMode.NewFile, TargetPath = target };
        var saved = Assert.IsType<OperatingPointSaved>(worker.Perform(save));
        Assert.Equal(target, saved.Plant.Path);
        Assert.Equal(8.0, saved.Plant.SweptParameter.Value);
        Assert.Equal(edited, File.ReadAllText(Conveyor));

        // Exactly what the operating-point writer makes of the document as loaded: nothing of the other edit.
        var point = Assert.Single(saved.Plant.OperatingPoints);
        var record = new OperatingPointRecord(point.Name, SavedAt, "tester@bench", [new("Kp", 8.0)], point.Verdict, point.Note);
        Assert.Equal(OperatingPointWriter.Apply(loaded.Document!, 8, record), File.ReadAllBytes(target));
        Assert.Empty(Directory.GetFiles(folder, "*.tmp").Concat(Directory.GetFiles(folder, ".*")));
    }

    [Fact]
    public void A_save_under_a_name_that_is_taken_is_refused_and_that_file_is_untouched()
    {
        var loaded = Load();
        string taken = Path.Combine(folder, "mine.toml");
        File.WriteAllText(taken, "someone's file");
        var refused = Assert.IsType<SaveRefused>(worker.Perform(Save(loaded, 8) with { Mode = SaveMode.NewFile, TargetPath = taken }));
        Assert.Equal(SaveRefusal.TargetExists, refused.Reason);
        Assert.Equal("someone's file", File.ReadAllText(taken));
    }

    [Fact]
    public void Writing_a_gone_file_again_recreates_it_and_a_file_back_with_other_bytes_is_refused()
    {
        var loaded = Load();
        string original = File.ReadAllText(Conveyor);
        File.Delete(Conveyor);
        var saved = Assert.IsType<OperatingPointSaved>(worker.Perform(Save(loaded, 8) with { Mode = SaveMode.WriteAgain }));
        Assert.Equal(8.0, saved.Plant.SweptParameter.Value);

        File.WriteAllText(Conveyor, original + "# put back, but edited\n");
        var refused = Assert.IsType<SaveRefused>(worker.Perform(Save(loaded, 9) with { Mode = SaveMode.WriteAgain }));
        Assert.Equal(SaveRefusal.FileChanged, refused.Reason);
        Assert.EndsWith("# put back, but edited\n", File.ReadAllText(Conveyor), StringComparison.Ordinal);
    }

    [Fact]
    public void The_check_compares_the_bytes_on_disk_with_those_loaded()
    {
        var loaded = Load();
        var sha = loaded.Document!.Sha256;
        Assert.Equal(FileOnDisk.AsLoaded, Check(sha).State);
        File.SetLastWriteTimeUtc(Conveyor, DateTime.UtcNow.AddHours(1)); // touched, same bytes
        Assert.Equal(FileOnDisk.AsLoaded, Check(sha).State);
        File.AppendAllText(Conveyor, "\n");
        var changed = Check(sha);
        Assert.Equal(FileOnDisk.Changed, changed.State);
        Assert.Equal(Path.Combine(folder, "conveyor-speed.2.toml"), changed.SuggestedPath);
        File.Delete(Conveyor);
        Assert.Equal(FileOnDisk.Missing, Check(sha).State);
    }

    [Fact]
    public void Opening_a_plant_finds_the_recovery_file_beside_it_and_a_reload_does_not()
    {
        var loaded = Load();
        Assert.Null(worker.Perform(new SaveRecoveryEffect(loaded, 9, "v")));
        File.SetLastWriteTimeUtc(Conveyor, DateTime.UtcNow.AddMinutes(-5));
        var opened = Assert.IsType<PlantLoaded>(worker.Perform(new LoadPlantEffect(Conveyor)));
        var recovery = opened.Recovery!;
        Assert.Equal(Recovery, recovery.Path);
        Assert.Equal("Kp", recovery.Parameter);
        Assert.Equal(9.0, recovery.Value);
        Assert.True(recovery.CanApply);
        Assert.False(recovery.Stale);
        Assert.Null(opened.Loaded.Plant.OperatingPoints.FirstOrDefault()); // the plant itself was not touched

        var reloaded = Assert.IsType<PlantLoaded>(worker.Perform(new LoadPlantEffect(Conveyor, new KeptValue("Kp", 9))));
        Assert.Null(reloaded.Recovery);
        Assert.Equal(new KeptValue("Kp", 9), reloaded.Kept);
    }

    [Fact]
    public void A_recovery_file_older_than_the_plant_is_found_stale()
    {
        Assert.Null(worker.Perform(new SaveRecoveryEffect(Load(), 9, "v")));
        // Both times set: a copied plant keeps its source's time, which may be older than two hours.
        File.SetLastWriteTimeUtc(Conveyor, DateTime.UtcNow);
        File.SetLastWriteTimeUtc(Recovery, DateTime.UtcNow.AddHours(-2));
        var recovery = Assert.IsType<PlantLoaded>(worker.Perform(new LoadPlantEffect(Conveyor))).Recovery!;
        Assert.True(recovery.Stale);
        Assert.True(recovery.CanApply);
    }

    [Theory]
    [InlineData("title = \"x\"\nKp = = 3\n", "it is not a readable plant file: conveyor-speed.toml.recovery:2:")]
    [InlineData("\u0000\u00ff\u00fe binary", "it is not a readable plant file: conveyor-speed.toml.recovery:")]
    public void A_broken_recovery_file_comes_back_with_its_problem_not_an_exception(string text, string problem)
    {
        File.WriteAllText(Recovery, text);
        var recovery = Assert.IsType<PlantLoaded>(worker.Perform(new LoadPlantEffect(Conveyor))).Recovery!;
        Assert.False(recovery.CanApply);
        Assert.StartsWith(problem, recovery.Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void A_recovery_file_for_another_swept_parameter_cannot_be_applied()
    {
        File.WriteAllText(Recovery, File.ReadAllText(Conveyor).Replace("sweep = \"Kp\"", "sweep = \"wi\"", StringComparison.Ordinal));
        var recovery = Assert.IsType<PlantLoaded>(worker.Perform(new LoadPlantEffect(Conveyor))).Recovery!;
        Assert.False(recovery.CanApply);
        Assert.Equal("it holds a value for wi, but the plant now sweeps Kp", recovery.Problem);
    }

    [Fact]
    public void A_recovery_file_is_deleted_on_request_and_nothing_else_is()
    {
        File.WriteAllText(Recovery, "x");
        Assert.Equal(new RecoveryDeleted(Recovery, null), worker.Perform(new DeleteRecoveryEffect(Recovery)));
        Assert.False(File.Exists(Recovery));
        Assert.Equal(new RecoveryDeleted(Conveyor, "not a recovery file"), worker.Perform(new DeleteRecoveryEffect(Conveyor)));
        Assert.True(File.Exists(Conveyor));
    }

    [Fact]
    public void The_library_does_not_list_a_recovery_file_as_a_plant()
    {
        Assert.Null(worker.Perform(new SaveRecoveryEffect(Load(), 9, "v")));
        Assert.True(File.Exists(Recovery));
        var scanned = Assert.IsType<LibraryScanned>(worker.Perform(new ScanLibraryEffect(folder)));
        Assert.Equal(["conveyor-speed.toml"], scanned.Items.Select(i => i.FileName));
    }

    [Fact]
    public void The_recovery_file_replaces_an_older_one_and_leaves_no_temporary_file()
    {
        var loaded = Load();
        Assert.Null(worker.Perform(new SaveRecoveryEffect(loaded, 9, "v")));
        Assert.Null(worker.Perform(new SaveRecoveryEffect(loaded, 11, "v")));
        Assert.Equal(11.0, PlantFileReader.Read(Recovery).SweptParameter.Value);
        Assert.Equal(2, Directory.GetFiles(folder).Length);
    }

    [Fact]
    public void The_recovery_files_record_says_it_is_no_saved_decision_and_a_real_save_writes_the_usual_one()
    {
        var loaded = Load();
        Assert.Null(worker.Perform(new SaveRecoveryEffect(loaded, 9, "v")));
        var recovered = PlantFileReader.Read(Recovery).OperatingPoints[^1];
        Assert.Equal("Kp = 9 (recovered, not saved)", recovered.Name);
        Assert.Equal("recovered after the workbench was ended before saving; not a saved decision", recovered.Note);

        Assert.IsType<OperatingPointSaved>(worker.Perform(new SaveOperatingPointEffect(loaded, 9, "verdict", false, "Kp = 9", SaveOverlay.DefaultNote)));
        var plant = PlantFileReader.Read(Conveyor);
        Assert.Equal(SaveOverlay.DefaultNote, plant.OperatingPoints[^1].Note);
        Assert.Equal("Kp = 9", plant.OperatingPoints[^1].Name);
        Assert.DoesNotContain(plant.OperatingPoints, p => p.Note == SaveRecoveryEffect.RecordNote);
    }

    private LoadedPlant Load() => Assert.IsType<PlantLoaded>(worker.Perform(new LoadPlantEffect(Conveyor))).Loaded;

    private static SaveOperatingPointEffect Save(LoadedPlant loaded, double value) => new(loaded, value, "verdict", false, $"Kp = {value}", "note");

    private PlantFileChecked Check(System.Collections.Immutable.ImmutableArray<byte> sha) =>
        Assert.IsType<PlantFileChecked>(worker.Perform(new CheckPlantFileEffect(Conveyor, sha)));

    private static string DemoPlants([CallerFilePath] string here = "") =>
        Path.GetFullPath(Path.Combine(Path.GetDirectoryName(here)!, "..", "..", "..", "plants"));
}
