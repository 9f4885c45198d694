using System.Runtime.CompilerServices;
using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

/// <summary>The effect worker on real plant files: copies of the demo plants in a temporary folder.</summary>
public sealed class EffectWorkerTests : IDisposable
{
    private static readonly DateTimeOffset SavedAt = new(2026, 3, 4, 5, 6, 7, TimeSpan.Zero);
    private readonly string folder = Path.Combine(Path.GetTempPath(), "termlocus-worker-" + Guid.NewGuid().ToString("N"));
    private readonly EffectWorker worker = new(new SaveContext(() => SavedAt, "tester@bench"));

    public EffectWorkerTests()
    {
        Directory.CreateDirectory(folder);
        foreach (var file in Directory.GetFiles(DemoPlants(), "*.toml"))
        {
            File.Copy(file, Path.Combine(folder, Path.GetFileName(file)));
        }
    }

    private string Conveyor => Path.Combine(folder, "conveyor-speed.toml");

    public void Dispose() => Directory.Delete(folder, recursive: true);

    [Fact]
    public void Loading_a_plant_builds_its_loop_at_the_files_values()
    {
        var loaded = Assert.IsType<PlantLoaded>(worker.Perform(new LoadPlantEffect(Conveyor))).Loaded;
        Assert.Equal("Kp", loaded.Plant.Loop.Sweep);
        Assert.Equal(0.0, loaded.Range.Low);
        Assert.Equal(150.0, loaded.Range.High);
        Assert.NotNull(loaded.Document);
        Assert.NotNull(loaded.Family.Affine); // Kp enters the characteristic polynomial linearly
    }

    [Fact]
    public void A_broken_file_fails_with_its_located_error()
    {
        string broken = Path.Combine(folder, "broken.toml");
        File.WriteAllText(broken, "title = \"broken\"\n[parameters]\nK = { value = \n");
        var failed = Assert.IsType<PlantLoadFailed>(worker.Perform(new LoadPlantEffect(broken)));
        Assert.Matches(@"broken\.toml:\d+:\d+: error: ", failed.Problem);
    }

    [Fact]
    public void Scanning_the_demo_folder_gives_each_file_a_verdict()
    {
        var scanned = Assert.IsType<LibraryScanned>(worker.Perform(new ScanLibraryEffect(folder)));
        Assert.Null(scanned.Problem);
        Assert.Equal(Directory.GetFiles(folder, "*.toml").Length, scanned.Items.Length);
        // The demo files say in their notes which pass and which fail as shipped.
        Assert.Equal(LibraryVerdict.Fail, scanned.Items.Single(i => i.FileName == "magnetic-bearing.toml").Verdict);
        Assert.Equal(LibraryVerdict.Pass, scanned.Items.Single(i => i.FileName == "conveyor-speed.toml").Verdict);
    }

    [Fact]
    public void A_missing_folder_is_reported_not_thrown()
    {
        var scanned = Assert.IsType<LibraryScanned>(worker.Perform(new ScanLibraryEffect(Path.Combine(folder, "nope"))));
        Assert.Empty(scanned.Items);
        Assert.NotNull(scanned.Problem);
    }

    [Fact]
    public void Tracing_gives_branches_and_sorted_marks_inside_the_range()
    {
        var loaded = ((PlantLoaded)worker.Perform(new LoadPlantEffect(Path.Combine(folder, "magnetic-bearing.toml")))!).Loaded;
        var analysis = Assert.IsType<LocusTraced>(worker.Perform(new TraceLocusEffect(loaded, loaded.NominalKey))).Analysis;
        Assert.NotEmpty(analysis.Branches);
        Assert.NotEmpty(analysis.Marks);
        Assert.Equal(analysis.Marks.OrderBy(m => m.Value).Select(m => m.Value), analysis.Marks.Select(m => m.Value));
        Assert.All(analysis.Marks, m => Assert.InRange(m.Value, loaded.Range.Low, loaded.Range.High));
        Assert.Contains(analysis.Marks, m => m.Kind == SweepMarkKind.SpecBoundary && m.SpecKey == "max_time_to_half");
    }

    [Fact]
    public void Saving_writes_the_value_and_an_operating_point_and_reads_the_file_back()
    {
        var loaded = ((PlantLoaded)worker.Perform(new LoadPlantEffect(Conveyor))!).Loaded;
        var saved = Assert.IsType<OperatingPointSaved>(worker.Perform(new SaveOperatingPointEffect(loaded, 8, "meets every spec", false)));
        Assert.Equal(8.0, saved.Plant.SweptParameter.Value);
        var point = Assert.Single(saved.Plant.OperatingPoints);
        Assert.Equal("tester@bench", point.By);
        Assert.Equal(SavedAt, point.SavedUtc);
        Assert.Equal(8.0, point.Values["Kp"]);
        Assert.NotNull(saved.Document);
    }

    [Fact]
    public void Saving_is_refused_when_the_file_changed_on_disk_since_it_was_read()
    {
        var loaded = ((PlantLoaded)worker.Perform(new LoadPlantEffect(Conveyor))!).Loaded;
        File.AppendAllText(Conveyor, "# edited by someone else\n");
        string edited = File.ReadAllText(Conveyor);
        var refused = Assert.IsType<SaveRefused>(worker.Perform(new SaveOperatingPointEffect(loaded, 8, "v", false)));
        Assert.Equal(SaveRefusal.FileChanged, refused.Reason);
        Assert.Contains("changed on disk", refused.Problem, StringComparison.Ordinal);
        Assert.Equal(edited, File.ReadAllText(Conveyor));
    }

    [Fact]
    public void The_recovery_file_goes_beside_the_plant_which_stays_untouched()
    {
        string original = File.ReadAllText(Conveyor);
        var loaded = ((PlantLoaded)worker.Perform(new LoadPlantEffect(Conveyor))!).Loaded;
        Assert.Null(worker.Perform(new SaveRecoveryEffect(loaded, 9, "v")));
        Assert.Equal(original, File.ReadAllText(Conveyor));
        string recovery = File.ReadAllText(Conveyor + ".recovery");
        Assert.Contains("value = 9.0", recovery, StringComparison.Ordinal);
        Assert.Contains("[[operating_points]]", recovery, StringComparison.Ordinal);
    }

    private static string DemoPlants([CallerFilePath] string here = "") =>
        Path.GetFullPath(Path.Combine(Path.GetDirectoryName(here)!, "..", "..", "..", "plants"));
}
