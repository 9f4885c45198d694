namespace TermLocus.CrashDriver;

/// <summary>
/// What recovery write K holds: the swept value, the verdict line and the time (the clock given to the workbench).
/// Four versions in turn, each different from the one before; odd ones carry a long verdict so that large and small
/// files alternate and a kill often falls inside a long write. The tests compute the expected bytes from the same
/// schedule with the same workbench code, in process.
/// </summary>
public static class RecoverySchedule
{
    /// <summary>How many different recovery files the schedule cycles through.</summary>
    public const int Versions = 4;

    /// <summary>The user written into each record.</summary>
    public const string By = "crash-test@driver";

    private static readonly DateTimeOffset Start = new(2026, 1, 2, 3, 4, 0, TimeSpan.Zero);

    private static readonly string LongVerdict = string.Concat(Enumerable.Repeat("meets every spec at nominal and across the band; ", 2000));

    /// <summary>The swept value of write <paramref name="index"/> (inside the conveyor demo's Kp range 0 to 150).</summary>
    public static double Value(long index) => (index % Versions) switch
    {
        0 => 6.5,
        1 => 12.25,
        2 => 7.5,
        _ => 14.125,
    };

    /// <summary>The verdict line of write <paramref name="index"/>: short for even, about 100 KB for odd.</summary>
    public static string Verdict(long index) => index % 2 == 0 ? "meets every spec" : LongVerdict;

    /// <summary>The record time of write <paramref name="index"/>.</summary>
    public static DateTimeOffset SavedAt(long index) => Start.AddMinutes(index % Versions);
}
