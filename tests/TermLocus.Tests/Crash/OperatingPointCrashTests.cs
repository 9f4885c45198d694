using System.Globalization;
using System.Runtime.Versioning;
using TermLocus.Core.Plants;
using Xunit.Abstractions;

namespace TermLocus.Tests.Crash;

/// <summary>
/// SIGKILL at random moments of operating-point saves: the plant file must afterwards be, byte for byte, the version
/// of the last finished save or of the save under way, never a mix, a truncation or a temporary file in its place
/// (POSIX rename(2) replaces the name atomically; common practice for crash-safe saving). The four versions are made
/// here with OperatingPointWriter from the conveyor demo plant; odd ones carry a note of about 250 KB, so large and
/// small files alternate and a kill often falls inside a long write.
/// </summary>
[Collection(CrashCollection.Name)]
[UnsupportedOSPlatform("windows")]
public sealed class OperatingPointCrashTests(ITestOutputHelper output) : IDisposable
{
    private static readonly double[] Values = [6.5, 12.25, 7.5, 14.125];

    private static readonly string LongNote = string.Concat(Enumerable.Repeat("bench log: belt loaded, speed held; ", 7000));

    private readonly CrashFolder folder = new();

    public void Dispose() => folder.Dispose();

    [UnixFact]
    public void A_killed_save_leaves_the_old_or_the_new_plant_file_whole()
    {
        int runs = CrashSettings.Runs(200);

        KillTallyAssert.EveryVersionWhole(KillSaves(runs, inPlace: false), runs, output, "inside a save", "inside the write");
    }

    [UnixFact]
    public void The_harness_catches_a_writer_that_rewrites_the_file_in_place()
    {
        KillTallyAssert.ProblemCaught(KillSaves(200, inPlace: true), output, "is not a version saved whole");
    }

    private KillTally KillSaves(int runs, bool inPlace)
    {
        folder.PlaceDemoPlant();
        var original = File.ReadAllBytes(folder.Plant);
        var versions = WriteVersions(folder.Sub("versions"));
        bool Holds(byte[] content, long save) => content.AsSpan().SequenceEqual(save < 0 ? original : versions[save % versions.Length]);

        Judgement Judge(KillReport report, long before)
        {
            var content = File.ReadAllBytes(folder.Plant);
            long? held = report.VersionHeld(before, save => Holds(content, save));
            var problem = PlantFolderCheck.Problem(folder.Library, folder.Plant, CrashFolder.PlantMode, ["plant.toml"], out bool tempLeft);
            if (held is null)
            {
                problem = $"plant.toml ({ContentFingerprint.Of(content)}) is not a version saved whole";
            }

            return new Judgement(held, tempLeft, problem);
        }

        string[] Arguments(long first) =>
            ["replace", folder.Plant, Path.Combine(folder.Root, "versions"), first.ToString(CultureInfo.InvariantCulture), .. inPlace ? ["--in-place"] : Array.Empty<string>()];

        string name = inPlace ? "operating-point save, in place (not atomic)" : "operating-point save";
        return KillLoop.Run(name, runs, TimeSpan.FromMilliseconds(40), Arguments, Judge);
    }

    private byte[][] WriteVersions(string versionsFolder)
    {
        var document = PlantFileReader.ReadDocument(folder.Plant);
        var versions = new byte[Values.Length][];
        for (int j = 0; j < Values.Length; j++)
        {
            var record = new OperatingPointRecord(
                $"crash test {j}", new DateTimeOffset(2026, 1, 2, 3, 4, j, TimeSpan.Zero), "crash-test@bench", [new("Kp", Values[j])], "meets every spec", j % 2 == 1 ? LongNote : "");
            versions[j] = OperatingPointWriter.Apply(document, Values[j], record);
            File.WriteAllBytes(Path.Combine(versionsFolder, $"v{j}.bin"), versions[j]);
        }

        return versions;
    }
}
