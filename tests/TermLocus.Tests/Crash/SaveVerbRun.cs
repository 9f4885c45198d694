using System.Diagnostics;
using System.Globalization;

namespace TermLocus.Tests.Crash;

/// <summary>
/// One run of the real <c>termlocus save</c> executable (built beside the tests), killed with SIGKILL either after a
/// fixed delay or a given time after its temporary file appears in the folder (seen through inotify), or left to finish.
/// </summary>
internal static class SaveVerbRun
{
    public const int KilledBySigkill = 128 + 9;

    public static string Executable => Path.Combine(AppContext.BaseDirectory, "termlocus");

    /// <param name="plant">The plant file to save into.</param>
    /// <param name="value">The swept value to save (Kp of the conveyor demo).</param>
    /// <param name="name">The operating point's name.</param>
    /// <param name="killAfter">Kill this long after the start, or null.</param>
    /// <param name="killAfterTemp">Kill this long after the saver's temporary file appears, or null.</param>
    /// <returns>The exit code (137 when killed) and how long the run took.</returns>
    public static (int ExitCode, TimeSpan Elapsed, string Errors) Run(string plant, double value, string name, TimeSpan? killAfter, TimeSpan? killAfterTemp)
    {
        using var child = new Process { StartInfo = StartInfo(plant, value, name) };
        using var watcher = new FileSystemWatcher(Path.GetDirectoryName(plant)!, $".{Path.GetFileName(plant)}.*.tmp") { NotifyFilter = NotifyFilters.FileName };
        if (killAfterTemp is { } afterTemp)
        {
            watcher.Created += (_, _) =>
            {
                PreciseDelay.Wait(afterTemp);
                Kill(child);
            };
            watcher.EnableRaisingEvents = true;
        }

        var clock = Stopwatch.StartNew();
        child.Start();
        var errors = child.StandardError.ReadToEndAsync();
        _ = child.StandardOutput.ReadToEndAsync();
        if (killAfter is { } after)
        {
            PreciseDelay.Wait(after);
            Kill(child);
        }

        if (!child.WaitForExit(TimeSpan.FromSeconds(60)))
        {
            Kill(child);
            throw new TimeoutException("termlocus save did not finish within 60 s");
        }

        return (child.ExitCode, clock.Elapsed, errors.Result);
    }

    private static ProcessStartInfo StartInfo(string plant, double value, string name)
    {
        var start = new ProcessStartInfo(Executable)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var argument in new[] { "save", plant, "--set", "Kp=" + value.ToString("R", CultureInfo.InvariantCulture), "--name", name, "--note", "killed at random" })
        {
            start.ArgumentList.Add(argument);
        }

        start.Environment["USER"] = "crash-test";
        return start;
    }

    private static void Kill(Process child)
    {
        try
        {
            child.Kill();
        }
        catch (InvalidOperationException)
        {
            // It finished first.
        }
    }
}
