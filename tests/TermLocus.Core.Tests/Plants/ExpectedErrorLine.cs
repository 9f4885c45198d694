using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;

namespace TermLocus.Core.Tests.Plants;

/// <summary>
/// Reads the error a fixture file must produce: its first line <c># expect: LINE:COL: MESSAGE</c>, or a sibling
/// <c>.expected</c> file when the fixture cannot hold a UTF-8 comment (a UTF-16 file).
/// </summary>
internal static partial class ExpectedErrorLine
{
    public static (int Line, int Column, string Message) Of(string path)
    {
        var sibling = path + ".expected";
        var text = File.Exists(sibling) ? File.ReadAllText(sibling).TrimEnd('\n') : FirstLine(path);
        var match = ExpectPattern().Match(text);
        Assert.True(match.Success, $"{path} states no expected error");
        return (int.Parse(match.Groups[1].Value, CultureInfo.InvariantCulture), int.Parse(match.Groups[2].Value, CultureInfo.InvariantCulture), match.Groups[3].Value);
    }

    /// <summary>The file names (*.toml) of a fixture folder in the test output, in ordinal order.</summary>
    public static TheoryData<string> FilesIn(string folder)
    {
        var data = new TheoryData<string>();
        foreach (var file in Directory.GetFiles(folder, "*.toml").Order(StringComparer.Ordinal))
        {
            data.Add(Path.GetFileName(file));
        }

        return data;
    }

    // The first line of every fixture is valid UTF-8 even when the rest of the file is not.
    private static string FirstLine(string path)
    {
        var bytes = File.ReadAllBytes(path);
        var end = Array.IndexOf(bytes, (byte)'\n');
        return Encoding.UTF8.GetString(bytes, 0, end < 0 ? bytes.Length : end);
    }

    [GeneratedRegex(@"^(?:# expect: )?(\d+):(\d+): (.*)$")]
    private static partial Regex ExpectPattern();
}
