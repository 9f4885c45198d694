using System.Text;

namespace TermLocus.Core.Expressions;

/// <summary>
/// Short, one-line quotes of expression text for error messages. Expression text that got past the lexer is plain
/// ASCII apart from whitespace, which is collapsed to single spaces, so quotes are safe to print on a terminal.
/// </summary>
internal static class SourceQuote
{
    /// <summary>The text between <paramref name="start"/> and <paramref name="end"/>, one line, at most <paramref name="maxLength"/> characters.</summary>
    public static string Of(string text, int start, int end, int maxLength)
    {
        start = Math.Clamp(start, 0, text.Length);
        end = Math.Clamp(end, start, text.Length);
        var sb = new StringBuilder(end - start);
        bool lastWasSpace = false;
        for (int i = start; i < end; i++)
        {
            char c = text[i];
            if (char.IsWhiteSpace(c))
            {
                if (!lastWasSpace)
                {
                    sb.Append(' ');
                }

                lastWasSpace = true;
            }
            else
            {
                sb.Append(c is >= ' ' and <= '~' ? c : '?');
                lastWasSpace = false;
            }
        }

        return Shorten(sb.ToString().Trim(), maxLength);
    }

    /// <summary><paramref name="s"/> cut to <paramref name="maxLength"/> characters with "..." when longer.</summary>
    public static string Shorten(string s, int maxLength) =>
        s.Length <= maxLength ? s : string.Concat(s.AsSpan(0, Math.Max(1, maxLength - 3)), "...");
}
