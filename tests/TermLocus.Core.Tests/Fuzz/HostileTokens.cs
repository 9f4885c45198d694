namespace TermLocus.Core.Tests.Fuzz;

/// <summary>Pieces of text that hostile or mistaken files are made of, for the generators.</summary>
internal static class HostileTokens
{
    public static readonly string FourHundredDigits = string.Concat(Enumerable.Repeat("9876543210", 40));

    /// <summary>Number literals that stress parsing and range: overflow, underflow, sub-normals, long digit runs.</summary>
    public static readonly string[] Numbers =
    [
        "0", "-0", "0.0", "1", "-1", "2", "0.5", ".5", "5.", "1e3", "1E-3", "4.7e-6", "1e308", "1.7976931348623157e308",
        "1e309", "-1e309", "1e-308", "5e-324", "1e-400", "1e999999999", "1e-999999999", "1e", "1e+", "1.2.3", "1__0",
        "1_000", "0x10", "0o7", "0b1", "+1", "nan", "inf", "-inf", "+inf", "NaN", "Infinity", FourHundredDigits,
        "0." + FourHundredDigits, FourHundredDigits + "e-400", "1" + new string('0', 400) + ".0", "00012", "9007199254740993",
    ];

    /// <summary>Expression tokens: operators, names of the demo plants, reserved words, functions, junk.</summary>
    public static readonly string[] ExpressionTokens =
    [
        "+", "-", "*", "/", "^", "(", ")", "((", "))", "s", "z", "pi", "sqrt", "exp", "ln", "abs", "sqrt(", "exp(", "ln(",
        "abs(", "Kp", "Kt", "J", "B", "wi", "tau_i", "K", "Ks", "m", "a", "Td", "x", "_", "__", "s2", "2s", "s^2", "s^100000",
        "s^-1", "s^0.5", "^-", "**", "//", "^^", ",", ".", "e", "E", "[", "]", "{", "}", "=", "\"", "'", "\\", "#", " ", "\t",
        "\u00B7", "\u00D7", "\u2212", "\u00F7", "\u00B2", "\uFF11", "\u03C0", "\u202E", "\u0085", "\u00A0", "\u2028",
    ];

    /// <summary>Whole-file tokens: TOML structure, keys, strings, control and odd characters.</summary>
    public static readonly string[] FileTokens =
    [
        "[", "]", "[[", "]]", "{", "}", "=", ",", ".", "\"", "'", "\"\"\"", "'''", "#", "\\", "\\u", "\\U0010FFFF", "\\uD800",
        "\\e", "\\x1b", "\n", "\r\n", "\r", "\t", " ", "\u0000", "\u001B", "\u001B[2J", "\u007F", "\u0085", "\u009B",
        "\u202E", "\u2066", "\u2028", "\u200F", "\uFEFF", "\uFFFD", "\uFFFF", "\u00E9", "\U0001F600",
        "[parameters]", "[loop]", "[specs]", "[[operating_points]]", "[operating_points]", "[parameters.Kp]", "title", "note",
        "value", "range", "band", "tolerance_pct", "unit", "plant", "controller", "sensor", "feedback", "characteristic",
        "sweep", "vary", "delay", "sample_time", "min_damping", "max_time_to_half", "min_decay_rate", "max_settling_time",
        "max_natural_frequency", "min_natural_frequency", "max_overshoot_pct", "name", "saved", "values", "verdict",
        "\"positive\"", "\"negative\"", "true", "false", "2026-11-30T14:05:00Z", "2026-11-30", "14:05:00", "[]", "{}",
        "[0, 1]", "[1, 0]", "[nan, inf]", "{ value = 1 }", "Kp", "J", "s", "\"s\"", "\"1/s\"", "\"s^100000\"", "a.b.c",
    ];
}
