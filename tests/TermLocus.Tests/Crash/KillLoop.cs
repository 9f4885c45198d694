namespace TermLocus.Tests.Crash;

/// <summary>
/// Starts a saving driver, kills it at a random moment, has the files judged, and again, from the version left:
/// save K writes version K, so the next child starts at the save after the one the file holds.
/// </summary>
internal static class KillLoop
{
    /// <param name="name">Names the loop in the figures.</param>
    /// <param name="runs">How many kills; the loop stops early at the first problem (the state is then unknown).</param>
    /// <param name="longestDelay">Kills fall uniformly between "ready" and this long after it.</param>
    /// <param name="arguments">The driver's arguments to start at a given save.</param>
    /// <param name="judge">Looks at the files after a kill, given what the child said and the save held before.</param>
    public static KillTally Run(string name, int runs, TimeSpan longestDelay, Func<long, string[]> arguments, Func<KillReport, long, Judgement> judge)
    {
        int seed = CrashSettings.Seed();
        var random = new Random(seed);
        var tally = new KillTally(name, seed);
        long held = -1;
        for (int run = 0; run < runs && tally.Problems.Count == 0; run++)
        {
            var report = CrashDriverProcess.RunAndKill(PreciseDelay.Draw(random, longestDelay), arguments(held + 1));
            var judgement = judge(report, held);
            tally.Add(run, report, held, judgement);
            held = judgement.Held ?? held;
        }

        CrashSettings.Report(tally.Summary);
        return tally;
    }
}
