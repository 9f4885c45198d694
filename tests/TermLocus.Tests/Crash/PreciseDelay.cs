using System.Diagnostics;

namespace TermLocus.Tests.Crash;

/// <summary>Waits a given time to well under a millisecond: sleeps most of it, spins the rest.</summary>
internal static class PreciseDelay
{
    public static void Wait(TimeSpan delay)
    {
        var clock = Stopwatch.StartNew();
        if (delay > TimeSpan.FromMilliseconds(2))
        {
            Thread.Sleep(delay - TimeSpan.FromMilliseconds(1.5));
        }

        while (clock.Elapsed < delay)
        {
            Thread.SpinWait(20);
        }
    }

    /// <summary>A delay drawn uniformly from zero to <paramref name="longest"/>, in whole microseconds.</summary>
    public static TimeSpan Draw(Random random, TimeSpan longest) =>
        TimeSpan.FromMicroseconds(random.NextInt64((long)longest.TotalMicroseconds + 1));
}
