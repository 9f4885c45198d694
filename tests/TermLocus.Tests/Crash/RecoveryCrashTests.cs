using System.Globalization;
using System.Runtime.Versioning;
using TermLocus.App.Workbench;
using TermLocus.CrashDriver;
using Xunit.Abstractions;

namespace TermLocus.Tests.Crash;

/// <summary>
/// SIGKILL at random moments while the workbench writes its recovery file (the SaveRecoveryEffect that the SIGHUP
/// and SIGTERM handlers perform): the recovery file must afterwards be absent (before the first write finished) or,
/// byte for byte, the last finished write or the one under way; the plant file is never touched. The expected bytes
/// come from the same effect performed here in process with the same clock and values (RecoverySchedule).
/// </summary>
[Collection(CrashCollection.Name)]
[UnsupportedOSPlatform("windows")]
public sealed class RecoveryCrashTests(ITestOutputHelper output) : IDisposable
{
    private readonly CrashFolder folder = new();

    public void Dispose() => folder.Dispose();

    [UnixFact]
    public void A_killed_recovery_write_leaves_no_recovery_file_or_a_whole_one_and_the_plant_untouched()
    {
        int runs = CrashSettings.Runs(100);

        KillTallyAssert.EveryVersionWhole(
            KillRecoveryWrites(runs, inPlace: false), runs, output, "inside a write", "between creating and renaming the file");
    }

    [UnixFact]
    public void The_harness_catches_a_recovery_writer_that_rewrites_the_file_in_place()
    {
        KillTallyAssert.ProblemCaught(KillRecoveryWrites(200, inPlace: true), output, "is not a version written whole");
    }

    private KillTally KillRecoveryWrites(int runs, bool inPlace)
    {
        folder.PlaceDemoPlant();
        var plant = File.ReadAllBytes(folder.Plant);
        var versions = ExpectedRecoveryFiles();
        string recovery = SaveRecoveryEffect.RecoveryPathFor(folder.Plant);
        bool Holds(byte[]? content, long write) => write < 0 ? content is null : content is not null && content.AsSpan().SequenceEqual(versions[write % versions.Length]);

        Judgement Judge(KillReport report, long before)
        {
            var content = File.Exists(recovery) ? File.ReadAllBytes(recovery) : null;
            long? held = report.VersionHeld(before, write => Holds(content, write));
            var problem = PlantFolderCheck.Problem(folder.Library, recovery, CrashFolder.PlantMode, ["plant.toml"], out bool tempLeft);
            if (!File.ReadAllBytes(folder.Plant).AsSpan().SequenceEqual(plant))
            {
                problem = "the plant file changed";
            }

            if (held is null)
            {
                problem = content is null
                    ? "the recovery file is missing after a finished write"
                    : $"the recovery file ({ContentFingerprint.Of(content)}) is not a version written whole";
            }

            return new Judgement(held, tempLeft, problem);
        }

        string[] Arguments(long first) =>
            ["recovery", folder.Plant, first.ToString(CultureInfo.InvariantCulture), .. inPlace ? ["--in-place"] : Array.Empty<string>()];

        string name = inPlace ? "recovery file, in place (not atomic)" : "recovery file";
        return KillLoop.Run(name, runs, TimeSpan.FromMilliseconds(80), Arguments, Judge);
    }

    // Each version is what the effect writes for that step of the schedule, written here into a copy of the plant.
    private byte[][] ExpectedRecoveryFiles()
    {
        string copy = Path.Combine(folder.Sub("expected"), "plant.toml");
        File.Copy(folder.Plant, copy);
        long step = 0;
        var worker = new EffectWorker(new SaveContext(() => RecoverySchedule.SavedAt(step), RecoverySchedule.By));
        var loaded = Assert.IsType<PlantLoaded>(worker.Perform(new LoadPlantEffect(copy))).Loaded;
        var versions = new byte[RecoverySchedule.Versions][];
        for (step = 0; step < versions.Length; step++)
        {
            Assert.Null(worker.Perform(new SaveRecoveryEffect(loaded, RecoverySchedule.Value(step), RecoverySchedule.Verdict(step))));
            versions[step] = File.ReadAllBytes(SaveRecoveryEffect.RecoveryPathFor(copy));
        }

        return versions;
    }
}
