using System.Globalization;

namespace TermLocus.Tests.Crash;

/// <summary>The figures of one kill loop: where the kills landed and what they left.</summary>
internal sealed class KillTally(string name, int seed)
{
    private readonly List<string> problems = [];

    public IReadOnlyList<string> Problems => problems;

    public int Runs { get; private set; }

    /// <summary>Kills that landed while a save was open (after its "begin", before its "done").</summary>
    public int InSave { get; private set; }

    /// <summary>Kills after which the save's temporary file was left: inside its write, flush or rename.</summary>
    public int TempAtKill { get; private set; }

    /// <summary>Kills that left the version being saved (the rename had happened, "done" not yet written).</summary>
    public int NewVersion { get; private set; }

    /// <summary>Kills that left the version of the last finished save (or the original).</summary>
    public int OldVersion { get; private set; }

    /// <summary>Saves the children finished in all.</summary>
    public long SavesFinished { get; private set; }

    public string Summary
    {
        get
        {
            var figures = string.Create(
                CultureInfo.InvariantCulture,
                $"{name}: seed {seed}, {Runs} kills, {SavesFinished} saves finished; killed inside a save {InSave} (temporary file left {TempAtKill}), between saves {Runs - InSave}; afterwards old version {OldVersion}, new version {NewVersion}, neither {problems.Count}");
            return problems.Count == 0 ? figures : figures + "; first problem: " + problems[0];
        }
    }

    public void Add(int run, KillReport report, long before, Judgement judgement)
    {
        Runs++;
        SavesFinished += (report.LastDone ?? before) - before;
        InSave += report.OpenSave is null ? 0 : 1;
        TempAtKill += judgement.TempLeft ? 1 : 0;
        if (judgement.Problem is { } problem)
        {
            problems.Add(string.Create(CultureInfo.InvariantCulture, $"run {run}, killed {report.Delay.TotalMilliseconds:0.###} ms after the child was ready (last save finished {report.LastDone?.ToString(CultureInfo.InvariantCulture) ?? "none"}, save open {report.OpenSave?.ToString(CultureInfo.InvariantCulture) ?? "none"}): {problem}"));
        }
        else if (judgement.Held == report.OpenSave)
        {
            NewVersion++;
        }
        else
        {
            OldVersion++;
        }
    }
}
