using System.Globalization;
using System.Text;

namespace TermLocus.Core.Plants;

/// <summary>
/// Makes untrusted file text safe to quote inside a one-line error message: control characters (C0, DEL, C1),
/// bidirectional overrides and line/paragraph separators become visible <c>\u{XXXX}</c> escapes, and long text is cut.
/// </summary>
internal static class PlantTextSafety
{
    /// <summary>Longest quoted text kept in a message, in UTF-16 code units.</summary>
    public const int MaxQuotedLength = 60;

    /// <summary>The text with every unsafe character escaped and cut to <paramref name="maxLength"/> code units.</summary>
    public static string Visible(string text, int maxLength = MaxQuotedLength)
    {
        var builder = new StringBuilder(Math.Min(text.Length, maxLength) + 8);
        foreach (var c in text)
        {
            if (builder.Length >= maxLength)
            {
                builder.Append('…');
                break;
            }

            if (IsUnsafe(c))
            {
                builder.Append(CultureInfo.InvariantCulture, $"\\u{{{(int)c:X4}}}");
            }
            else
            {
                builder.Append(c);
            }
        }

        return builder.ToString();
    }

    /// <summary>True for characters that must not reach a terminal raw.</summary>
    public static bool IsUnsafe(char c) =>
        c < 0x20 || (c >= 0x7F && c <= 0x9F) || (c >= 0x202A && c <= 0x202E) || (c >= 0x2066 && c <= 0x2069)
        || c == 0x200E || c == 0x200F || c == 0x061C || c == 0x2028 || c == 0x2029;
}
