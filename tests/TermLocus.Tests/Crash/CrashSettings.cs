using System.Globalization;

namespace TermLocus.Tests.Crash;

/// <summary>
/// How long the crash tests run. CI kills each saving child a few hundred times in all; TERMLOCUS_CRASH_SCALE
/// multiplies every count for a long run, TERMLOCUS_CRASH_SEED replays one run's kill moments, and
/// TERMLOCUS_CRASH_REPORT names a file that each test appends its figures to.
/// </summary>
internal static class CrashSettings
{
    /// <summary>The kill count for a test whose CI default is <paramref name="ciDefault"/>.</summary>
    public static int Runs(int ciDefault) =>
        Environment.GetEnvironmentVariable("TERMLOCUS_CRASH_SCALE") is { Length: > 0 } text
            ? checked(ciDefault * int.Parse(text, CultureInfo.InvariantCulture))
            : ciDefault;

    /// <summary>The seed of the kill moments: TERMLOCUS_CRASH_SEED, else a fresh one (printed with the figures).</summary>
    public static int Seed() =>
        Environment.GetEnvironmentVariable("TERMLOCUS_CRASH_SEED") is { Length: > 0 } text
            ? int.Parse(text, CultureInfo.InvariantCulture)
            : Random.Shared.Next();

    /// <summary>Appends one line of figures to the report file, when one is named.</summary>
    public static void Report(string line)
    {
        if (Environment.GetEnvironmentVariable("TERMLOCUS_CRASH_REPORT") is { Length: > 0 } path)
        {
            lock (typeof(CrashSettings))
            {
                File.AppendAllText(path, line + Environment.NewLine);
            }
        }
    }
}
