using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Fuzz;

/// <summary>
/// The rules every <see cref="PlantFileException"/> must keep for hostile input (terminal-ux design, point 8: text
/// from files is untrusted): its message is one line, names the file, points inside the file, and carries no C0/C1
/// control character, DEL, bidi override or line/paragraph separator.
/// </summary>
internal static class ErrorRules
{
    /// <summary>Throws <see cref="FuzzCaseException"/> naming the broken rule.</summary>
    public static void Check(PlantFileException e, string path, ReadOnlySpan<byte> fileBytes)
    {
        var message = e.Message;
        if (e.Error.File != path || !message.StartsWith(path + ":", StringComparison.Ordinal))
        {
            throw new FuzzCaseException($"the error does not name the file: {FuzzSession.Shorten(message)}");
        }

        foreach (var c in message)
        {
            if (IsUnsafe(c))
            {
                throw new FuzzCaseException($"the error holds character U+{(int)c:X4}: {FuzzSession.Shorten(message)}");
            }
        }

        var (line, column) = (e.Error.Position.Line, e.Error.Position.Column);
        int lineBytes = LineLength(fileBytes, line);
        if (line < 1 || column < 1 || lineBytes < 0 || column > lineBytes + 1)
        {
            throw new FuzzCaseException($"the error points outside the file ({line}:{column}, that line has {lineBytes} bytes): {FuzzSession.Shorten(message)}");
        }
    }

    /// <summary>Rules for an error on inline text (the expression parser alone): one line of text, column inside it.</summary>
    public static void CheckInline(PlantFileException e, string path, string text)
    {
        Check(e, path, System.Text.Encoding.UTF8.GetBytes(text.Replace('\n', ' ')));
    }

    /// <summary>C0, DEL, C1, bidi overrides and isolates, marks, and line/paragraph separators.</summary>
    public static bool IsUnsafe(char c) =>
        char.IsControl(c) || c is >= '\u202A' and <= '\u202E' or >= '\u2066' and <= '\u2069'
            or '\u200E' or '\u200F' or '\u061C' or '\u2028' or '\u2029';

    // Bytes on 1-based line `line` (without its line feed), or -1 when the file has no such line. Columns count
    // UTF-16 code units, never more than the UTF-8 bytes, so this is an upper bound for the column.
    private static int LineLength(ReadOnlySpan<byte> bytes, int line)
    {
        int current = 1;
        int start = 0;
        for (int i = 0; i < bytes.Length && current < line; i++)
        {
            if (bytes[i] == (byte)'\n')
            {
                current++;
                start = i + 1;
            }
        }

        if (current != line)
        {
            return -1;
        }

        int end = bytes[start..].IndexOf((byte)'\n');
        return end < 0 ? bytes.Length - start : end;
    }
}
