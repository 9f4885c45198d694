using System.Globalization;
using System.Text;

namespace TermLocus.App.Text;

/// <summary>
/// Makes untrusted text (titles, notes, names and units from plant files, file names) safe to draw or print:
/// control characters that a terminal would act on are replaced by visible spellings, so a file cannot retitle
/// a window, write the clipboard or fake the screen. Every presenter passes file text through here.
/// </summary>
public static class SafeText
{
    /// <summary>
    /// The text with every C0 control (including ESC) shown in caret notation (<c>^[</c>), DEL as <c>^?</c>,
    /// C1 controls (including the one-byte CSI 0x9B) and bidirectional/format controls as <c>&lt;U+XXXX&gt;</c>,
    /// tab as a space and unpaired surrogates as U+FFFD. Line breaks become visible too: the result is one line.
    /// </summary>
    public static string Visible(string? text)
    {
        if (string.IsNullOrEmpty(text))
        {
            return string.Empty;
        }

        if (!NeedsWork(text))
        {
            return text;
        }

        var sb = new StringBuilder(text.Length + 8);
        foreach (var rune in EnumerateRunes(text))
        {
            AppendVisible(sb, rune);
        }

        return sb.ToString();
    }

    /// <summary>
    /// <see cref="Visible"/>, then cut to at most <paramref name="width"/> terminal columns, ending in
    /// <paramref name="ellipsis"/> when cut.
    /// </summary>
    public static string Fit(string? text, int width, string ellipsis = "~")
    {
        string visible = Visible(text);
        if (width <= 0)
        {
            return string.Empty;
        }

        if (TextWidth.Of(visible) <= width)
        {
            return visible;
        }

        return TextWidth.Cut(visible, Math.Max(0, width - TextWidth.Of(ellipsis))) + ellipsis;
    }

    /// <summary>
    /// True for a character a terminal may act on rather than show: C0 controls (line feed included), DEL, C1 controls
    /// (the one-byte CSI 0x9B included) and the bidirectional and line/paragraph format controls. Surrogates are not
    /// controls; <see cref="Visible"/> handles unpaired ones.
    /// </summary>
    public static bool IsControl(char c) => c < 0x20 || (c >= 0x7F && c <= 0x9F) || IsFormatControl(c);

    private static bool NeedsWork(string text)
    {
        foreach (char c in text)
        {
            if (c < 0x20 || (c >= 0x7F && c <= 0x9F) || IsFormatControl(c) || char.IsSurrogate(c))
            {
                return true;
            }
        }

        return false;
    }

    private static IEnumerable<Rune> EnumerateRunes(string text)
    {
        for (int i = 0; i < text.Length;)
        {
            if (Rune.TryGetRuneAt(text, i, out var rune))
            {
                yield return rune;
                i += rune.Utf16SequenceLength;
            }
            else
            {
                yield return Rune.ReplacementChar;
                i++;
            }
        }
    }

    private static void AppendVisible(StringBuilder sb, Rune rune)
    {
        int v = rune.Value;
        if (v == '\t')
        {
            sb.Append(' ');
        }
        else if (v < 0x20)
        {
            sb.Append('^').Append((char)(v + 0x40));
        }
        else if (v == 0x7F)
        {
            sb.Append("^?");
        }
        else if ((v >= 0x80 && v <= 0x9F) || (v <= 0xFFFF && IsFormatControl((char)v)))
        {
            sb.Append("<U+").Append(v.ToString("X4", CultureInfo.InvariantCulture)).Append('>');
        }
        else
        {
            sb.Append(rune.ToString());
        }
    }

    // Bidirectional embeddings, overrides and isolates, marks, and the line/paragraph separators: each can reorder
    // or break what the user sees.
    private static bool IsFormatControl(char c) =>
        c is '\u061C' or '\u200E' or '\u200F' or '\u2028' or '\u2029'
        || (c >= '\u202A' && c <= '\u202E')
        || (c >= '\u2066' && c <= '\u2069');
}
