using System.Runtime.CompilerServices;

namespace TermLocus.Tests.Tui;

/// <summary>Compares a screen with a stored snapshot; on a mismatch writes <c>NAME.actual</c> beside it.</summary>
internal static class Snapshot
{
    public static void Match(string name, string screen, [CallerFilePath] string callerFile = "")
    {
        string folder = Path.Combine(Path.GetDirectoryName(callerFile)!, "Snapshots");
        string expectedPath = Path.Combine(folder, name + ".txt");
        string actualPath = Path.Combine(folder, name + ".actual");
        string actual = Scrub(screen);
        string? expected = File.Exists(expectedPath) ? File.ReadAllText(expectedPath) : null;
        if (expected == actual)
        {
            if (File.Exists(actualPath))
            {
                File.Delete(actualPath);
            }

            return;
        }

        File.WriteAllText(actualPath, actual);
        Assert.Fail(expected is null
            ? $"no snapshot {expectedPath}; wrote {actualPath} (review it, then rename it to .txt)"
            : $"screen differs from {expectedPath}; wrote {actualPath}");
    }

    // Trailing blanks carry no meaning; times and machine paths would make snapshots differ between runs and machines.
    private static string Scrub(string screen)
    {
        var lines = screen.Replace("\r", string.Empty, StringComparison.Ordinal).Split('\n').Select(l => l.TrimEnd());
        string text = string.Join('\n', lines).TrimEnd('\n') + "\n";
        text = System.Text.RegularExpressions.Regex.Replace(text, @"\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d(\.\d+)?Z?", "<time>");
        return text.Replace(Path.GetTempPath().TrimEnd('/'), "<tmp>", StringComparison.Ordinal);
    }
}
