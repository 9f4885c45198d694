using System.Globalization;
using System.Runtime.Versioning;
using System.Security.Cryptography;
using TermLocus.Core.Plants;
using TermLocus.Tests.Cli;
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
    // Not what a umask gives a new file, so a save that loses the bits shows.
    private const UnixFileMode PlantMode = UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead;

    private static readonly double[] Values = [6.5, 12.25, 7.5, 14.125];

    private static readonly string LongNote = string.Concat(Enumerable.Repeat("bench log: belt loaded, speed held; ", 7000));

    private readonly CrashFolder folder = new();

    public void Dispose() => folder.Dispose();

    [UnixFact]
    public void A_killed_save_leaves_the_old_or_the_new_plant_file_whole()
    {
        int runs = CrashSettings.Runs(200);

        var tally = KillSaves(runs, inPlace: false);

        output.WriteLine(tally.Summary);
        Assert.Empty(tally.Problems);
        Assert.Equal(runs, tally.Runs);
        Assert.True(tally.InSave >= runs / 2, "most kills should land inside a save: " + tally.Summary);
        Assert.True(tally.TempAtKill > 0, "some kills should land inside the write: " + tally.Summary);
    }

    [UnixFact]
    public void The_harness_catches_a_writer_that_rewrites_the_file_in_place()
    {
        var tally = KillSaves(200, inPlace: true);

        output.WriteLine(tally.Summary);
        Assert.NotEmpty(tally.Problems);
        Assert.Contains("is not a version saved whole", tally.Problems[0], StringComparison.Ordinal);
    }

    private KillTally KillSaves(int runs, bool inPlace)
    {
        File.Copy(RepoFiles.Plant("conveyor-speed.toml"), folder.Plant);
        File.SetUnixFileMode(folder.Plant, PlantMode);
        var original = File.ReadAllBytes(folder.Plant);
        var versions = WriteVersions(folder.Sub("versions"));
        bool Holds(byte[] content, long save) => content.AsSpan().SequenceEqual(save < 0 ? original : versions[save % versions.Length]);

        Judgement Judge(KillReport report, long before)
        {
            var content = File.ReadAllBytes(folder.Plant);
            long settled = report.LastDone ?? before;
            long? held = Holds(content, settled) ? settled : report.OpenSave is { } open && Holds(content, open) ? open : null;
            var problem = PlantFolderCheck.Problem(folder.Library, folder.Plant, PlantMode, ["plant.toml"], out bool tempLeft);
            if (held is null)
            {
                problem = string.Create(CultureInfo.InvariantCulture, $"plant.toml ({content.Length} bytes, SHA-256 {Convert.ToHexString(SHA256.HashData(content))[..12]}) is not a version saved whole");
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
