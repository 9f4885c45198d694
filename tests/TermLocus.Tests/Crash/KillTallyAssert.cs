using Xunit.Abstractions;

namespace TermLocus.Tests.Crash;

/// <summary>
/// The checks shared by the kill loops over one file's writes: a real writer leaves every version whole, and the
/// harness is shown to catch a writer that rewrites the file in place. Both print the figures first.
/// </summary>
internal static class KillTallyAssert
{
    /// <summary>
    /// No kill left a problem, all <paramref name="runs"/> kills ran, at least half of them fell inside a write
    /// (<paramref name="insideWrite"/> says where, in the failure message) and some left the temporary file
    /// (<paramref name="tempLeft"/> likewise).
    /// </summary>
    public static void EveryVersionWhole(KillTally tally, int runs, ITestOutputHelper output, string insideWrite, string tempLeft)
    {
        output.WriteLine(tally.Summary);
        Assert.Empty(tally.Problems);
        Assert.Equal(runs, tally.Runs);
        Assert.True(tally.InSave >= runs / 2, $"most kills should land {insideWrite}: " + tally.Summary);
        Assert.True(tally.TempAtKill > 0, $"some kills should land {tempLeft}: " + tally.Summary);
    }

    /// <summary>The loop found a problem, and the first one contains <paramref name="expected"/>.</summary>
    public static void ProblemCaught(KillTally tally, ITestOutputHelper output, string expected)
    {
        output.WriteLine(tally.Summary);
        Assert.NotEmpty(tally.Problems);
        Assert.Contains(expected, tally.Problems[0], StringComparison.Ordinal);
    }
}
