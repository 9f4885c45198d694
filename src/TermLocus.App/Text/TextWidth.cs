using System.Text;

namespace TermLocus.App.Text;

/// <summary>
/// Terminal column widths of already-safe text: wide East Asian characters take two columns, combining marks none.
/// Good enough for laying out presenter lines; the terminal has the last word.
/// </summary>
public static class TextWidth
{
    /// <summary>Columns <paramref name="text"/> occupies.</summary>
    public static int Of(string text)
    {
        int width = 0;
        foreach (var rune in text.EnumerateRunes())
        {
            width += Of(rune);
        }

        return width;
    }

    /// <summary>Columns one character occupies (0, 1 or 2).</summary>
    public static int Of(Rune rune)
    {
        var category = Rune.GetUnicodeCategory(rune);
        if (category is System.Globalization.UnicodeCategory.NonSpacingMark
            or System.Globalization.UnicodeCategory.EnclosingMark
            or System.Globalization.UnicodeCategory.Format)
        {
            return 0;
        }

        return IsWide(rune.Value) ? 2 : 1;
    }

    /// <summary>The longest prefix of <paramref name="text"/> that fits in <paramref name="width"/> columns.</summary>
    public static string Cut(string text, int width)
    {
        var sb = new StringBuilder();
        int used = 0;
        foreach (var rune in text.EnumerateRunes())
        {
            int w = Of(rune);
            if (used + w > width)
            {
                break;
            }

            sb.Append(rune.ToString());
            used += w;
        }

        return sb.ToString();
    }

    /// <summary><paramref name="text"/> cut or padded with spaces to exactly <paramref name="width"/> columns.</summary>
    public static string PadRight(string text, int width)
    {
        string cut = Of(text) > width ? Cut(text, width) : text;
        return cut + new string(' ', Math.Max(0, width - Of(cut)));
    }

    /// <summary><paramref name="text"/> cut, or padded on the left, to exactly <paramref name="width"/> columns.</summary>
    public static string PadLeft(string text, int width)
    {
        string cut = Of(text) > width ? Cut(text, width) : text;
        return new string(' ', Math.Max(0, width - Of(cut))) + cut;
    }

    private static bool IsWide(int v) =>
        (v >= 0x1100 && v <= 0x115F) || (v >= 0x2E80 && v <= 0x303E) || (v >= 0x3041 && v <= 0x33FF)
        || (v >= 0x3400 && v <= 0x4DBF) || (v >= 0x4E00 && v <= 0x9FFF) || (v >= 0xA000 && v <= 0xA4CF)
        || (v >= 0xAC00 && v <= 0xD7A3) || (v >= 0xF900 && v <= 0xFAFF) || (v >= 0xFE30 && v <= 0xFE4F)
        || (v >= 0xFF00 && v <= 0xFF60) || (v >= 0xFFE0 && v <= 0xFFE6) || (v >= 0x1F300 && v <= 0x1F64F)
        || (v >= 0x1F900 && v <= 0x1F9FF) || (v >= 0x20000 && v <= 0x3FFFD);
}
