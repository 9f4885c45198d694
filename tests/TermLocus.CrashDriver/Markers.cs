using System.Globalization;

namespace TermLocus.CrashDriver;

/// <summary>
/// One line on stdout per step. Console.Out writes through at once, so every line written before the SIGKILL is in
/// the pipe for the parent to read; a write failing because the parent is gone ends the loop (no orphan keeps saving).
/// </summary>
internal static class Markers
{
    public static void Ready() => Console.Out.WriteLine("ready");

    public static void Begin(long index) => Console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture, $"begin {index}"));

    public static void Done(long index) => Console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture, $"done {index}"));
}
