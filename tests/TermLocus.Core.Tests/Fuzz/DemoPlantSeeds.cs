using System.Text;

namespace TermLocus.Core.Tests.Fuzz;

/// <summary>The bundled demo plants (invented scenarios), the seeds every mutation starts from.</summary>
internal static class DemoPlantSeeds
{
    private static readonly Lazy<string[]> Texts = new(() =>
        [.. Directory.GetFiles(Path.Combine(AppContext.BaseDirectory, "DemoPlants"), "*.toml")
            .Order(StringComparer.Ordinal)
            .Select(File.ReadAllText)]);

    /// <summary>The demo files' texts, sorted by file name.</summary>
    public static IReadOnlyList<string> All => Texts.Value;

    /// <summary>The conveyor demo, the seed of the hand-written hostile cases.</summary>
    public static string Conveyor => All.Single(t => t.Contains("Conveyor belt speed loop", StringComparison.Ordinal));

    public static byte[] Utf8(string text) => Encoding.UTF8.GetBytes(text);
}
