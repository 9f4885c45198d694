using System.Globalization;

namespace TermLocus.Core.Tests.Fuzz;

/// <summary>
/// How long the fuzz tests run. CI runs a few thousand cases; TERMLOCUS_FUZZ_ITERATIONS raises the count of every
/// fuzz test for a long run, TERMLOCUS_FUZZ_SEED replays one CsCheck seed, and TERMLOCUS_FUZZ_REPORT names a file
/// that each test appends its figures to (cases, wall time, slowest case).
/// </summary>
internal static class FuzzSettings
{
    /// <summary>Longest time one input may take through the whole pipeline; a slower one is a failure (a hang).</summary>
    public static readonly TimeSpan CaseTimeout = TimeSpan.FromSeconds(ReadDouble("TERMLOCUS_FUZZ_CASE_SECONDS", 10.0));

    /// <summary>The case count for a test whose CI default is <paramref name="ciDefault"/>.</summary>
    public static long Iterations(long ciDefault) =>
        Environment.GetEnvironmentVariable("TERMLOCUS_FUZZ_ITERATIONS") is { Length: > 0 } text
            ? long.Parse(text, CultureInfo.InvariantCulture)
            : ciDefault;

    /// <summary>A seed to replay, or null for a fresh random run.</summary>
    public static string? Seed => Environment.GetEnvironmentVariable("TERMLOCUS_FUZZ_SEED") is { Length: > 0 } s ? s : null;

    /// <summary>Threads for CsCheck: one in CI (the machine is shared), two for a long run.</summary>
    public static int Threads => Environment.GetEnvironmentVariable("TERMLOCUS_FUZZ_ITERATIONS") is { Length: > 0 } ? 2 : 1;

    /// <summary>Appends one line of figures to the report file, when one is named.</summary>
    public static void Report(string line)
    {
        if (Environment.GetEnvironmentVariable("TERMLOCUS_FUZZ_REPORT") is { Length: > 0 } path)
        {
            lock (typeof(FuzzSettings))
            {
                File.AppendAllText(path, line + Environment.NewLine);
            }
        }
    }

    private static double ReadDouble(string name, double fallback) =>
        Environment.GetEnvironmentVariable(name) is { Length: > 0 } text ? double.Parse(text, CultureInfo.InvariantCulture) : fallback;
}
