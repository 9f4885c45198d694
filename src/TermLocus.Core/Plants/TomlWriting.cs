using System.Globalization;
using System.Text;

namespace TermLocus.Core.Plants;

/// <summary>Spells values as TOML 1.0 text (nothing from TOML 1.1, so every TOML reader accepts the result).</summary>
internal static class TomlWriting
{
    /// <summary>A TOML float: the shortest text that reads back to exactly <paramref name="value"/>, always a float.</summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or infinite.</exception>
    public static string Float(double value)
    {
        if (!double.IsFinite(value))
        {
            throw new ArgumentOutOfRangeException(nameof(value), value, "A plant file holds finite numbers only.");
        }

        var text = value.ToString("R", CultureInfo.InvariantCulture).Replace('E', 'e');
        return text.Contains('.', StringComparison.Ordinal) || text.Contains('e', StringComparison.Ordinal) ? text : text + ".0";
    }

    /// <summary>
    /// A TOML basic string. Quotes, backslashes, control characters (C0, DEL, C1), bidirectional controls and line
    /// separators are escaped so the file shows them plainly; a lone surrogate (not encodable) becomes an escaped U+FFFD.
    /// </summary>
    public static string BasicString(string text)
    {
        var builder = new StringBuilder(text.Length + 2).Append('"');
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
            {
                builder.Append(c).Append(text[++i]);
                continue;
            }

            builder.Append(c switch
            {
                '"' => "\\\"",
                '\\' => "\\\\",
                '\b' => "\\b",
                '\t' => "\\t",
                '\n' => "\\n",
                '\f' => "\\f",
                '\r' => "\\r",
                // A lone surrogate cannot be encoded; Tomlyn refuses a literal U+FFFD, so both are written escaped.
                _ when char.IsSurrogate(c) || c == '\uFFFD' => "\\uFFFD",
                _ when PlantTextSafety.IsUnsafe(c) => string.Create(CultureInfo.InvariantCulture, $"\\u{(int)c:X4}"),
                _ => c.ToString(),
            });
        }

        return builder.Append('"').ToString();
    }

    /// <summary>A key: bare when it is made of letters, digits, _ and -, else a basic string.</summary>
    public static string Key(string name)
    {
        var bare = name.Length > 0 && name.All(c => char.IsAsciiLetterOrDigit(c) || c is '_' or '-');
        return bare ? name : BasicString(name);
    }

    /// <summary>An offset date-time in UTC to the second, e.g. <c>2026-11-30T14:05:00Z</c>.</summary>
    public static string UtcDateTime(DateTimeOffset instant) =>
        instant.UtcDateTime.ToString("yyyy'-'MM'-'dd'T'HH':'mm':'ss'Z'", CultureInfo.InvariantCulture);
}
