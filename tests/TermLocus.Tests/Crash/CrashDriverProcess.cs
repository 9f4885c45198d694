using System.Diagnostics;

namespace TermLocus.Tests.Crash;

/// <summary>
/// Starts the test-only driver (tests/TermLocus.CrashDriver, copied beside this assembly), waits until it is ready
/// to save, lets it save for the given time and kills it with SIGKILL (what Process.Kill sends on Unix): no handler,
/// no flush, no cleanup can run.
/// </summary>
internal static class CrashDriverProcess
{
    private const int KilledBySigkill = 128 + 9;

    public static string Path => System.IO.Path.Combine(AppContext.BaseDirectory, "TermLocus.CrashDriver");

    public static KillReport RunAndKill(TimeSpan delay, params string[] arguments)
    {
        var start = new ProcessStartInfo(Path)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var argument in arguments)
        {
            start.ArgumentList.Add(argument);
        }

        using var child = Process.Start(start)!;
        var errors = child.StandardError.ReadToEndAsync();
        if (child.StandardOutput.ReadLine() != "ready")
        {
            child.WaitForExit();
            throw new InvalidOperationException($"the crash driver did not start ({string.Join(' ', arguments)}): {errors.Result}");
        }

        PreciseDelay.Wait(delay);
        child.Kill();
        child.WaitForExit();
        var lines = child.StandardOutput.ReadToEnd().Split('\n', StringSplitOptions.RemoveEmptyEntries);
        if (child.ExitCode != KilledBySigkill)
        {
            throw new InvalidOperationException($"the crash driver ended by itself with exit code {child.ExitCode} before the kill: {errors.Result}");
        }

        return KillReport.Parse(lines, delay);
    }
}
