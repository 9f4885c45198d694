using System.Collections.Immutable;
using System.Globalization;

namespace TermLocus.Cli;

/// <summary>Parses the repeatable <c>--set NAME=VALUE</c> option into parameter overrides.</summary>
internal static class ValueOverrides
{
    /// <summary>
    /// The overrides by name, in command-line order (a later one wins). Throws <see cref="UsageException"/> for
    /// text without '=', an empty name, or a value that is not a finite invariant-culture number.
    /// </summary>
    public static ImmutableDictionary<string, double> Parse(IEnumerable<string> settings)
    {
        var result = ImmutableDictionary.CreateBuilder<string, double>(StringComparer.Ordinal);
        foreach (var setting in settings)
        {
            int eq = setting.IndexOf('=', StringComparison.Ordinal);
            if (eq <= 0)
            {
                throw new UsageException($"--set expects NAME=VALUE, got '{setting}'");
            }

            string name = setting[..eq].Trim();
            string text = setting[(eq + 1)..].Trim();
            if (!double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double value) || !double.IsFinite(value))
            {
                throw new UsageException($"--set {name}: '{text}' is not a finite number");
            }

            result[name] = value;
        }

        return result.ToImmutable();
    }
}
