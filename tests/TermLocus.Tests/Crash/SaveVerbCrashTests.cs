using System.Globalization;
using System.Runtime.Versioning;
using System.Text;
using TermLocus.Core.Plants;
using Xunit.Abstractions;

namespace TermLocus.Tests.Crash;

/// <summary>
/// SIGKILL of the real <c>termlocus save</c> executable, at a random moment of its run or just after its temporary
/// file appears: the plant file must afterwards be the old file byte for byte, or exactly what OperatingPointWriter
/// makes of the old file with the record the verb wrote (its time, user and verdict read back from the file).
/// </summary>
[Collection(CrashCollection.Name)]
[UnsupportedOSPlatform("windows")]
public sealed class SaveVerbCrashTests(ITestOutputHelper output) : IDisposable
{
    private static readonly double[] Values = [6.5, 12.25, 7.5, 14.125];

    private readonly CrashFolder folder = new();

    public void Dispose() => folder.Dispose();

    [UnixFact]
    public void A_killed_save_verb_leaves_the_old_or_the_new_plant_file_whole()
    {
        int runs = CrashSettings.Runs(40);
        int seed = CrashSettings.Seed();
        var random = new Random(seed);
        folder.PlaceDemoPlant();
        var full = WarmUp();
        var tally = new Dictionary<string, int>(StringComparer.Ordinal) { ["killed"] = 0, ["after the temporary file appeared"] = 0, ["temporary file left"] = 0, ["old"] = 0, ["new"] = 0, ["finished"] = 0 };
        string? problem = null;
        for (int run = 0; run < runs && problem is null; run++)
        {
            problem = KillOnce(run, random, full, tally);
        }

        string summary = string.Create(CultureInfo.InvariantCulture, $"save verb: seed {seed}, {runs} runs ({full.TotalMilliseconds:0} ms unkilled): ") +
            string.Join(", ", tally.Select(t => string.Create(CultureInfo.InvariantCulture, $"{t.Key} {t.Value}"))) + (problem is null ? "" : "; " + problem);
        CrashSettings.Report(summary);
        output.WriteLine(summary);
        Assert.Null(problem);
        Assert.True(tally["temporary file left"] > 0, "some kills should land inside the save: " + summary);
    }

    // Two unkilled runs: how long the verb takes here, and that its result is recognised as the new version.
    private TimeSpan WarmUp()
    {
        var full = TimeSpan.Zero;
        for (int warm = 0; warm < 2; warm++)
        {
            var before = File.ReadAllBytes(folder.Plant);
            var (code, elapsed, errors) = SaveVerbRun.Run(folder.Plant, Values[warm], $"warm-up {warm}", null, null);
            Assert.True(code is 0 or 1, errors);
            var after = File.ReadAllBytes(folder.Plant);
            Assert.False(after.AsSpan().SequenceEqual(before));
            Assert.Null(Check(after, Values[warm], before));
            full = elapsed > full ? elapsed : full;
        }

        return full;
    }

    // One run and its kill; null when the files are as they must be, else what is wrong.
    private string? KillOnce(int run, Random random, TimeSpan full, Dictionary<string, int> tally)
    {
        var before = File.ReadAllBytes(folder.Plant);
        double value = Values[run % Values.Length];
        // Even runs: anywhere in the run (mostly start-up). Odd runs: in the save, 0 to 4 ms after the temporary file
        // appeared (creating, writing, flushing and renaming it took 1 to 2 ms here, the folder flush about 2 ms more).
        var (code, _, errors) = run % 2 == 0
            ? SaveVerbRun.Run(folder.Plant, value, $"run {run}", PreciseDelay.Draw(random, full), null)
            : SaveVerbRun.Run(folder.Plant, value, $"run {run}", null, PreciseDelay.Draw(random, TimeSpan.FromMilliseconds(4)));
        var after = File.ReadAllBytes(folder.Plant);
        var folderProblem = PlantFolderCheck.Problem(folder.Library, folder.Plant, CrashFolder.PlantMode, ["plant.toml"], out bool tempLeft);
        bool killed = code == SaveVerbRun.KilledBySigkill;
        tally[killed ? "killed" : "finished"]++;
        tally["after the temporary file appeared"] += run % 2 == 1 && killed ? 1 : 0;
        tally["temporary file left"] += tempLeft ? 1 : 0;
        tally[after.AsSpan().SequenceEqual(before) ? "old" : "new"]++;
        var problem = code is not (SaveVerbRun.KilledBySigkill or 0 or 1) ? $"exit code {code}: {errors}" : Check(after, value, before) ?? folderProblem;
        return problem is null ? null : string.Create(CultureInfo.InvariantCulture, $"run {run}: {problem}");
    }

    // Null when the file is the old one, or the old one with this value saved by the verb; else what is wrong.
    private string? Check(byte[] after, double value, byte[] before)
    {
        if (after.AsSpan().SequenceEqual(before))
        {
            return null;
        }

        Plant plant;
        try
        {
            plant = PlantFileReader.ParseDocument(after, folder.Plant).Plant;
        }
        catch (PlantFileException e)
        {
            return $"plant.toml ({after.Length} bytes) is neither the old file ({before.Length} bytes) nor a plant file: {e.Error}";
        }

        var point = plant.OperatingPoints[^1];
        var record = new OperatingPointRecord(point.Name, point.SavedUtc!.Value, point.By, [new("Kp", value)], point.Verdict, point.Note);
        var expected = Encoding.UTF8.GetBytes(OperatingPointWriter.Apply(Encoding.UTF8.GetString(before), "Kp", value, record, folder.Plant));
        return expected.AsSpan().SequenceEqual(after)
            ? null
            : string.Create(CultureInfo.InvariantCulture, $"plant.toml ({after.Length} bytes) is neither the old file ({before.Length} bytes) nor the old file with Kp = {value} saved ({expected.Length} bytes)");
    }
}
