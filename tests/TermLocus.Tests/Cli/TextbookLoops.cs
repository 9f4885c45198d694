using System.Globalization;

namespace TermLocus.Tests.Cli;

/// <summary>
/// The textbook loops the verb tests share, as plant-file text (each test names its source beside its use).
/// </summary>
internal static class TextbookLoops
{
    /// <summary>K/(s(s + 1)(s + 2)) in unity negative feedback, K swept over [0, 20] from <paramref name="k"/>.</summary>
    /// <param name="specs">The <c>[specs]</c> lines, one per line (empty for none).</param>
    public static string ThirdOrder(string title, string specs, double k = 1.0) => $"""
        title = "{title}"
        [parameters]
        K = {"{"} value = {k.ToString("0.0", CultureInfo.InvariantCulture)}, range = [0.0, 20.0] {"}"}
        [loop]
        plant = "K / (s*(s + 1)*(s + 2))"
        sweep = "K"
        [specs]
        {specs}
        """;

    /// <summary>K/(s(s + 1)) behind a zero-order hold with T = 1 s, K swept over [0, 4] from 1.</summary>
    public static string SampledTypeOne(string title) => $"""
        title = "{title}"
        [parameters]
        K = {"{"} value = 1.0, range = [0.0, 4.0] {"}"}
        [loop]
        plant = "K / (s*(s + 1))"
        sample_time = 1.0
        sweep = "K"
        """;
}
