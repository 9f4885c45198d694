namespace TermLocus.Tests.Crash;

/// <summary>
/// What a killed child said before it died.
/// </summary>
/// <param name="LastDone">The last save it finished, or null when it finished none.</param>
/// <param name="OpenSave">The save it had begun and not finished when killed, or null when killed between saves.</param>
/// <param name="Delay">How long after "ready" the SIGKILL was sent.</param>
internal sealed record KillReport(long? LastDone, long? OpenSave, TimeSpan Delay)
{
    /// <summary>
    /// The save whose version the file holds, by <paramref name="holds"/>: the last finished one (or
    /// <paramref name="before"/>, the one held before this child, when it finished none), else the one open at the
    /// kill, else null (no version allowed).
    /// </summary>
    public long? VersionHeld(long before, Func<long, bool> holds)
    {
        long settled = LastDone ?? before;
        return holds(settled) ? settled : OpenSave is { } open && holds(open) ? open : null;
    }

    /// <summary>Reads the "begin K" / "done K" lines the driver wrote.</summary>
    public static KillReport Parse(IEnumerable<string> lines, TimeSpan delay)
    {
        long? done = null;
        long? open = null;
        foreach (var line in lines)
        {
            var parts = line.Split(' ');
            if (parts is ["begin", var b])
            {
                open = long.Parse(b, System.Globalization.CultureInfo.InvariantCulture);
            }
            else if (parts is ["done", var d])
            {
                done = long.Parse(d, System.Globalization.CultureInfo.InvariantCulture);
                open = null;
            }
        }

        return new KillReport(done, open, delay);
    }
}
