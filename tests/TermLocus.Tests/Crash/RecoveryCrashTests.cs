using System.Globalization;
using System.Runtime.Versioning;
using System.Security.Cryptography;
using TermLocus.App.Workbench;
using TermLocus.CrashDriver;
using TermLocus.Tests.Cli;
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
    // Private to the owner and group: the recovery copy must not be readable by more people than the plant file.
    private const UnixFileMode PlantMode = UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead;

    private readonly CrashFolder folder = new();

    public void Dispose() => folder.Dispose();

    [UnixFact]
    public void A_killed_recovery_write_leaves_no_recovery_file_or_a_whole_one_and_the_plant_untouched()
    {
        int runs = CrashSettings.Runs(100);

        var tally = KillRecoveryWrites(runs, inPlace: false);

        output.WriteLine(tally.Summary);
        Assert.Empty(tally.Problems);
        Assert.Equal(runs, tally.Runs);
        Assert.True(tally.InSave >= runs / 2, "most kills should land inside a write: " + tally.Summary);
        Assert.True(tally.TempAtKill > 0, "some kills should land between creating and renaming the file: " + tally.Summary);
    }

    [UnixFact]
    public void The_harness_catches_a_recovery_writer_that_rewrites_the_file_in_place()
    {
        var tally = KillRecoveryWrites(200, inPlace: true);

        output.WriteLine(tally.Summary);
        Assert.NotEmpty(tally.Problems);
        Assert.Contains("is not a version written whole", tally.Problems[0], StringComparison.Ordinal);
    }

    private KillTally KillRecoveryWrites(int runs, bool inPlace)
    {
        File.Copy(RepoFiles.Plant("conveyor-speed.toml"), folder.Plant);
        File.SetUnixFileMode(folder.Plant, PlantMode);
        var plant = File.ReadAllBytes(folder.Plant);
        var versions = ExpectedRecoveryFiles();
        string recovery = SaveRecoveryEffect.RecoveryPathFor(folder.Plant);
        bool Holds(byte[]? content, long write) => write < 0 ? content is null : content is not null && content.AsSpan().SequenceEqual(versions[write % versions.Length]);

        Judgement Judge(KillReport report, long before)
        {
            var content = File.Exists(recovery) ? File.ReadAllBytes(recovery) : null;
            long settled = report.LastDone ?? before;
            long? held = Holds(content, settled) ? settled : report.OpenSave is { } open && Holds(content, open) ? open : null;
            var problem = PlantFolderCheck.Problem(folder.Library, recovery, PlantMode, ["plant.toml"], out bool tempLeft);
            if (!File.ReadAllBytes(folder.Plant).AsSpan().SequenceEqual(plant))
            {
                problem = "the plant file changed";
            }

            if (held is null)
            {
                problem = content is null
                    ? "the recovery file is missing after a finished write"
                    : string.Create(CultureInfo.InvariantCulture, $"the recovery file ({content.Length} bytes, SHA-256 {Convert.ToHexString(SHA256.HashData(content))[..12]}) is not a version written whole");
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
