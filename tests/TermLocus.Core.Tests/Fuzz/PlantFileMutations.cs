using System.Text;
using System.Text.RegularExpressions;
using CsCheck;

namespace TermLocus.Core.Tests.Fuzz;

/// <summary>
/// CsCheck generators of hostile plant files: a demo plant put through one to six mutations. Positions are drawn as
/// fractions of the current length so that each mutation fits the file the previous ones left.
/// </summary>
internal static partial class PlantFileMutations
{
    private static readonly Gen<double> Where = Gen.Double[0.0, 1.0];

    // Long runs (lines and files of 10 kB to 1 MB) cost a hundred times a short edit, so they come rarely.
    private static readonly Gen<Mutation> LongRun =
        Gen.Select(Where, Gen.OneOfConst("x", "(", "[", "{", "a.", "1+", "\\\\", "#", " ", "\"", "Kt*", "[[x]]\n"), Gen.Int[1, 200_000],
            (w, t, n) => new Mutation($"insert '{t}' x{n} at {w:F4}", b => Insert(b, w, Utf8(string.Concat(Enumerable.Repeat(t, n))))));

    private static readonly Gen<Mutation> ShortEdit = Gen.Frequency(
        (3, Gen.Select(Where, Gen.Int[0, 7], (w, bit) => new Mutation($"flip bit {bit} at {w:F4}", b => FlipBit(b, w, bit)))),
        (1, Gen.Select(Where, Gen.OneOfConst("x", "(", "[", "a.", "1+", "-", "{a="), Gen.Int[50, 3000],
            (w, t, n) => new Mutation($"insert '{t}' x{n} at {w:F4}", b => Insert(b, w, Utf8(string.Concat(Enumerable.Repeat(t, n))))))),
        (3, Gen.Select(Where, Gen.Byte, (w, v) => new Mutation($"set byte 0x{v:X2} at {w:F4}", b => SetByte(b, w, v)))),
        (4, Gen.Select(Where, Gen.OneOfConst(HostileTokens.FileTokens), (w, t) => new Mutation($"insert '{t}' at {w:F4}", b => Insert(b, w, Utf8(t))))),
        (3, Gen.Select(Where, Gen.OneOfConst(HostileTokens.Numbers), (w, t) => new Mutation($"insert number '{t}' at {w:F4}", b => Insert(b, w, Utf8(t))))),
        (2, Gen.Select(Where, Gen.Int[1, 64], (w, n) => new Mutation($"delete {n} at {w:F4}", b => Delete(b, w, n)))),
        (1, Where.Select(w => new Mutation($"truncate at {w:F4}", b => b[..(int)(w * b.Length)]))),
        (2, Gen.Select(Where, Gen.Int[1, 3], (w, n) => new Mutation($"duplicate line at {w:F4} x{n}", b => DuplicateLine(b, w, n)))),
        (1, Gen.Select(Where, Where, (w, v) => new Mutation($"swap lines at {w:F4} and {v:F4}", b => SwapLines(b, w, v)))),
        (4, Gen.Select(Where, Gen.OneOfConst(HostileTokens.Numbers), (w, t) => new Mutation($"number at {w:F4} becomes '{t}'", b => ReplaceNumber(b, w, t)))),
        (5, Gen.Select(Where, ExpressionGenerators.Any, (w, e) => new Mutation($"expression at {w:F4} becomes \"{e}\"", b => ReplaceExpression(b, w, e)))),
        (1, Gen.Select(Where, Gen.OneOfConst("\r\n", "\r", "\n\r", "\r\r\n"), (w, nl) => new Mutation($"new lines after {w:F4} become {Escape(nl)}", b => NewLines(b, w, nl)))),

        (1, Gen.Select(Where, Gen.Byte[0x80, 0xFF].Array[1, 4], (w, v) => new Mutation($"insert bytes {Convert.ToHexString(v)} at {w:F4}", b => Insert(b, w, v)))));

    // Declared after the generators it draws from: static fields initialise in order.
    private static readonly Gen<Mutation> OneMutation = Gen.Frequency((200, ShortEdit), (1, LongRun));

    /// <summary>A mutated demo plant, with the list of mutations that made it.</summary>
    public static readonly Gen<FuzzFile> File = Gen.Select(
        Gen.Int[0, 1000], OneMutation.Array[1, 6], (seed, mutations) =>
        {
            var texts = DemoPlantSeeds.All;
            var bytes = Utf8(texts[seed % texts.Count]);
            foreach (var m in mutations)
            {
                bytes = m.Apply(bytes);
            }

            return new FuzzFile(bytes, $"demo #{seed % texts.Count}: " + string.Join("; ", mutations.Select(m => m.Name)));
        });

    private static byte[] Utf8(string text) => Encoding.UTF8.GetBytes(text);

    private static string Escape(string text) => text.Replace("\r", "\\r", StringComparison.Ordinal).Replace("\n", "\\n", StringComparison.Ordinal);

    private static int At(byte[] b, double w) => Math.Min((int)(w * b.Length), b.Length);

    private static byte[] FlipBit(byte[] b, double w, int bit)
    {
        if (b.Length == 0)
        {
            return b;
        }

        var copy = (byte[])b.Clone();
        copy[Math.Min(At(b, w), b.Length - 1)] ^= (byte)(1 << bit);
        return copy;
    }

    private static byte[] SetByte(byte[] b, double w, byte value)
    {
        if (b.Length == 0)
        {
            return b;
        }

        var copy = (byte[])b.Clone();
        copy[Math.Min(At(b, w), b.Length - 1)] = value;
        return copy;
    }

    private static byte[] Insert(byte[] b, double w, byte[] piece)
    {
        int at = At(b, w);
        return [.. b.AsSpan(0, at), .. piece, .. b.AsSpan(at)];
    }

    private static byte[] Delete(byte[] b, double w, int n)
    {
        int at = At(b, w);
        int end = Math.Min(b.Length, at + n);
        return [.. b.AsSpan(0, at), .. b.AsSpan(end)];
    }

    private static byte[] DuplicateLine(byte[] b, double w, int copies)
    {
        var (start, end) = LineAround(b, w);
        var line = b[start..end];
        var inserted = Enumerable.Repeat(line, copies).SelectMany(l => l).ToArray();
        return [.. b.AsSpan(0, end), .. inserted, .. b.AsSpan(end)];
    }

    private static byte[] SwapLines(byte[] b, double w, double v)
    {
        var first = LineAround(b, Math.Min(w, v));
        var second = LineAround(b, Math.Max(w, v));
        if (second.Start < first.End)
        {
            return b;
        }

        return [.. b.AsSpan(0, first.Start), .. b.AsSpan(second.Start, second.End - second.Start),
            .. b.AsSpan(first.End, second.Start - first.End), .. b.AsSpan(first.Start, first.End - first.Start), .. b.AsSpan(second.End)];
    }

    // The line (with its line feed) holding the byte at fraction w.
    private static (int Start, int End) LineAround(byte[] b, double w)
    {
        int at = Math.Min(At(b, w), Math.Max(b.Length - 1, 0));
        int start = b.Length == 0 ? 0 : Array.LastIndexOf(b, (byte)'\n', Math.Max(at - 1, 0)) + 1;
        if (at == 0)
        {
            start = 0;
        }

        int newline = Array.IndexOf(b, (byte)'\n', at);
        return (start, newline < 0 ? b.Length : newline + 1);
    }

    private static byte[] ReplaceNumber(byte[] b, double w, string literal) => ReplaceMatch(b, w, NumberLiteral(), literal);

    private static byte[] ReplaceExpression(byte[] b, double w, string expression)
    {
        // Quotes and backslashes are escaped so that the expression, not the TOML, is what breaks.
        var escaped = expression.Replace("\\", "\\\\", StringComparison.Ordinal).Replace("\"", "\\\"", StringComparison.Ordinal);
        return ReplaceMatch(b, w, ExpressionValue(), escaped);
    }

    private static byte[] ReplaceMatch(byte[] b, double w, Regex pattern, string replacement)
    {
        var text = Encoding.UTF8.GetString(b);
        var matches = pattern.Matches(text);
        if (matches.Count == 0 || text.Contains('\uFFFD', StringComparison.Ordinal))
        {
            return b;
        }

        var group = matches[Math.Min((int)(w * matches.Count), matches.Count - 1)].Groups[1];
        return Utf8(string.Concat(text.AsSpan(0, group.Index), replacement, text.AsSpan(group.Index + group.Length)));
    }

    private static byte[] NewLines(byte[] b, double w, string newLine)
    {
        int at = At(b, w);
        var tail = Encoding.UTF8.GetString(b, at, b.Length - at).Replace("\n", newLine, StringComparison.Ordinal);
        return [.. b.AsSpan(0, at), .. Utf8(tail)];
    }

    [GeneratedRegex(@"(?<![A-Za-z_])([-+]?[0-9][0-9_.eE+-]*)")]
    private static partial Regex NumberLiteral();

    [GeneratedRegex(@"(?:plant|controller|sensor|characteristic)\s*=\s*""([^""\n]*)""")]
    private static partial Regex ExpressionValue();

    private sealed record Mutation(string Name, Func<byte[], byte[]> Apply);
}
