namespace TermLocus.App.Canvas;

/// <summary>
/// Picks braille or ASCII from an explicit request (<c>--symbols braille|ascii|auto</c>) or else from the locale:
/// the first non-empty of LC_ALL, LC_CTYPE, LANG decides the character encoding (POSIX precedence), and only a
/// UTF-8 locale gets braille, because other encodings show braille as garbage.
/// </summary>
public static class SymbolChoice
{
    private static readonly string[] LocaleVariables = ["LC_ALL", "LC_CTYPE", "LANG"];

    /// <summary>The symbol set for <paramref name="environment"/> unless <paramref name="requested"/> names one.</summary>
    /// <param name="environment">Environment variables by name; missing and null mean unset.</param>
    /// <param name="requested">"braille", "ascii", "auto" or null (case-insensitive).</param>
    /// <exception cref="ArgumentException">When <paramref name="requested"/> is not one of the accepted words.</exception>
    public static CanvasSymbols Detect(IReadOnlyDictionary<string, string?> environment, string? requested = null)
    {
        ArgumentNullException.ThrowIfNull(environment);
        if (!TryParseRequest(requested, out CanvasSymbols? explicitChoice))
        {
            throw new ArgumentException($"symbols must be braille, ascii or auto, not '{requested}'", nameof(requested));
        }

        return explicitChoice ?? FromLocale(environment);
    }

    /// <summary>Reads a request word: "braille" or "ascii" give that set, "auto", empty or null give null (decide
    /// from the locale). False for anything else.</summary>
    public static bool TryParseRequest(string? requested, out CanvasSymbols? symbols)
    {
        symbols = null;
        string word = requested?.Trim() ?? string.Empty;
        if (word.Length == 0 || word.Equals("auto", StringComparison.OrdinalIgnoreCase))
        {
            return true;
        }

        if (word.Equals("braille", StringComparison.OrdinalIgnoreCase))
        {
            symbols = CanvasSymbols.Braille;
            return true;
        }

        if (word.Equals("ascii", StringComparison.OrdinalIgnoreCase))
        {
            symbols = CanvasSymbols.Ascii;
            return true;
        }

        return false;
    }

    /// <summary>Braille when the effective locale's encoding is UTF-8 (spelt UTF-8 or utf8), else ASCII.</summary>
    public static CanvasSymbols FromLocale(IReadOnlyDictionary<string, string?> environment)
    {
        ArgumentNullException.ThrowIfNull(environment);
        foreach (string name in LocaleVariables)
        {
            if (environment.TryGetValue(name, out string? value) && !string.IsNullOrEmpty(value))
            {
                return IsUtf8(value) ? CanvasSymbols.Braille : CanvasSymbols.Ascii;
            }
        }

        return CanvasSymbols.Ascii;
    }

    private static bool IsUtf8(string locale) =>
        locale.Contains("UTF-8", StringComparison.OrdinalIgnoreCase)
        || locale.Contains("UTF8", StringComparison.OrdinalIgnoreCase);
}
