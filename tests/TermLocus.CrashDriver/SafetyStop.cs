namespace TermLocus.CrashDriver;

/// <summary>A loop ends by itself after this many saves, should nobody kill it.</summary>
internal static class SafetyStop
{
    public const long MaxSaves = 100_000;
}
