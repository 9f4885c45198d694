using System.Globalization;
using System.Text;
using TermLocus.Core.Plants;
using TermLocus.Core.Tests.Plants;

namespace TermLocus.Core.Tests.Hardening;

/// <summary>
/// A library folder of 1,000 generated plant files, one in seven broken in one of seven ways, scanned at once.
/// Expected (PlantLibrary contract): every *.toml file listed once, sorted by name (ordinal), hidden and other files
/// left out, each broken file with its located error and each good one with its plant. Correctness only; the speed
/// of a scan is measured by tests/TermLocus.Benchmarks/Plants/PlantLibraryScanBenchmark.
/// </summary>
public sealed class PlantLibraryScaleTests
{
    private const int FileCount = 1000;

    private const string GoodTemplate = """
        # Invented example for a test: generated library entry {0}.
        title = "Generated loop {0}"

        [parameters]
        K   = {{ value = {1}, range = [0.0, 50.0] }}
        tau = {{ value = 0.25, tolerance_pct = 20 }}

        [loop]
        plant      = "1 / (s * (tau*s + 1))"
        controller = "K"
        sweep = "K"

        [specs]
        min_damping = 0.4

        """;

    // Each way to break a file, with the line its error must point at.
    private static readonly (string Kind, int Line, Func<string, byte[]> Break)[] Breakages =
    [
        ("unclosed string", 2, good => Utf8(good.Replace("title = \"Generated", "title = Generated", StringComparison.Ordinal))),
        ("missing loop", 1, good => Utf8(good[..good.IndexOf("[loop]", StringComparison.Ordinal)])),
        ("sweep names no parameter", 11, good => Utf8(good.Replace("sweep = \"K\"", "sweep = \"Q\"", StringComparison.Ordinal))),
        ("invalid UTF-8", 2, good => [.. Utf8(good)[..60], 0xC3, 0x28, .. Utf8(good)[60..]]),
        ("NUL byte", 2, good => [.. Utf8(good)[..70], 0x00, .. Utf8(good)[70..]]),
        ("duplicate key", 6, good => Utf8(good.Replace("tau = {", "K = {", StringComparison.Ordinal))),
        ("range not finite", 5, good => Utf8(good.Replace("range = [0.0, 50.0]", "range = [0.0, inf]", StringComparison.Ordinal))),
    ];

    [Fact]
    public void A_thousand_files_are_all_listed_in_order_with_their_errors()
    {
        using var folder = new TemporaryFolder();
        var expected = new SortedDictionary<string, (string? Kind, int Line)>(StringComparer.Ordinal);
        for (int i = 0; i < FileCount; i++)
        {
            // Upper-case extensions count as plant files too; names sort by ordinal, so mixed case is a real test.
            string name = string.Create(CultureInfo.InvariantCulture, $"{(i % 3 == 0 ? "Loop" : "loop")}-{i:D4}.{(i % 10 == 0 ? "TOML" : "toml")}");
            string good = string.Format(CultureInfo.InvariantCulture, GoodTemplate, i, 1 + (i % 4));
            if (i % 7 == 3)
            {
                var (kind, line, breakIt) = Breakages[(i / 7) % Breakages.Length];
                File.WriteAllBytes(folder.File(name), breakIt(good));
                expected[name] = (kind, line);
            }
            else
            {
                File.WriteAllText(folder.File(name), good);
                expected[name] = (null, 0);
            }
        }

        File.WriteAllText(folder.File(".hidden.toml"), "not listed");
        File.WriteAllText(folder.File("readme.txt"), "not listed");
        Directory.CreateDirectory(folder.File("sub.toml"));

        var entries = PlantLibrary.Scan(folder.Path);

        Assert.Equal(expected.Keys, entries.Select(e => e.FileName));
        foreach (var entry in entries)
        {
            var (kind, line) = expected[entry.FileName];
            Assert.Equal(folder.File(entry.FileName), entry.Path);
            if (kind is null)
            {
                Assert.True(entry.IsValid, $"{entry.FileName}: {entry.Error}");
                Assert.StartsWith("Generated loop ", entry.Title, StringComparison.Ordinal);
            }
            else
            {
                Assert.False(entry.IsValid, $"{entry.FileName} ({kind}) loaded");
                var error = entry.Error!;
                Assert.Equal(entry.Path, error.File);
                Assert.True(line == error.Position.Line, $"{entry.FileName} ({kind}): {error}");
                Assert.DoesNotContain('\n', error.ToString());
            }
        }

        Assert.Equal(Enumerable.Range(0, FileCount).Count(i => i % 7 == 3), entries.Count(e => !e.IsValid));
    }

    private static byte[] Utf8(string text) => Encoding.UTF8.GetBytes(text);
}
