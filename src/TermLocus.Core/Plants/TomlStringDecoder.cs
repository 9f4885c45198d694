using System.Globalization;
using System.Text;

namespace TermLocus.Core.Plants;

/// <summary>
/// Decodes the source text of one TOML string token (basic, literal, and both multi-line forms) and records, for
/// every decoded UTF-16 unit, the offset inside the token of the source character it came from. An escape maps
/// all its units to its backslash; the extra last entry is the offset of the closing delimiter.
/// </summary>
internal static class TomlStringDecoder
{
    /// <summary>
    /// The decoded value and the token-relative source offset of each of its characters plus one past the end,
    /// or null when <paramref name="token"/> is not a well-formed string token (the parser has then reported it).
    /// </summary>
    public static (string Value, int[] Offsets)? Decode(string token)
    {
        var multi = token.StartsWith("\"\"\"", StringComparison.Ordinal) || token.StartsWith("'''", StringComparison.Ordinal);
        var delimiter = multi ? 3 : 1;
        if (token.Length < 2 * delimiter || (token[0] != '"' && token[0] != '\''))
        {
            return null;
        }

        var start = delimiter;
        var end = token.Length - delimiter;
        if (multi)
        {
            start += token.AsSpan(start).StartsWith("\r\n") ? 2 : token.AsSpan(start).StartsWith("\n") ? 1 : 0;
        }

        var literal = token[0] == '\'';
        var state = new DecodeState(token, end);
        for (var i = start; i < end;)
        {
            i = literal || token[i] != '\\' ? state.Copy(i) : state.Escape(i, multi);
            if (i < 0)
            {
                return null;
            }
        }

        state.Offsets.Add(end);
        return (state.Value.ToString(), [.. state.Offsets]);
    }

    private sealed class DecodeState(string token, int end)
    {
        public StringBuilder Value { get; } = new();

        public List<int> Offsets { get; } = [];

        public int Copy(int i)
        {
            Append(token[i], i);
            return i + 1;
        }

        public int Escape(int i, bool multi)
        {
            if (i + 1 >= end)
            {
                return -1;
            }

            var code = token[i + 1];
            switch (code)
            {
                case 'b': Append('\b', i); return i + 2;
                case 't': Append('\t', i); return i + 2;
                case 'n': Append('\n', i); return i + 2;
                case 'f': Append('\f', i); return i + 2;
                case 'r': Append('\r', i); return i + 2;
                case 'e': Append('\u001B', i); return i + 2;
                case '"': Append('"', i); return i + 2;
                case '\\': Append('\\', i); return i + 2;
                case 'x': return Hex(i, 2);
                case 'u': return Hex(i, 4);
                case 'U': return Hex(i, 8);
                default: return multi ? SkipLineEnding(i + 1) : -1;
            }
        }

        private int Hex(int i, int digits)
        {
            if (i + 2 + digits > end || !int.TryParse(token.AsSpan(i + 2, digits), NumberStyles.AllowHexSpecifier, CultureInfo.InvariantCulture, out var code)
                || code < 0 || code > 0x10FFFF || (code >= 0xD800 && code <= 0xDFFF))
            {
                return -1;
            }

            foreach (var c in char.ConvertFromUtf32(code))
            {
                Append(c, i);
            }

            return i + 2 + digits;
        }

        // A backslash that ends a line trims it and all whitespace and newlines after it.
        private int SkipLineEnding(int i)
        {
            var j = i;
            while (j < end && (token[j] == ' ' || token[j] == '\t'))
            {
                j++;
            }

            if (j >= end || (token[j] != '\n' && token[j] != '\r'))
            {
                return -1;
            }

            while (j < end && (token[j] is ' ' or '\t' or '\n' or '\r'))
            {
                j++;
            }

            return j;
        }

        private void Append(char c, int offset)
        {
            Value.Append(c);
            Offsets.Add(offset);
        }
    }
}
