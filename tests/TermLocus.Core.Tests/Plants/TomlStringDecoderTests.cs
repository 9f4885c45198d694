using System.Globalization;
using System.Text;
using CsCheck;
using TermLocus.Core.Plants;
using Tomlyn.Parsing;
using Tomlyn.Syntax;

namespace TermLocus.Core.Tests.Plants;

/// <summary>
/// The decoder's value is checked against Tomlyn's own decoding of the same token (an independent implementation
/// of the TOML 1.0 string rules); its offsets must point at the character itself or at the escape's backslash.
/// </summary>
public sealed class TomlStringDecoderTests
{
    private static readonly string[] Alphabet = ["a", "K", "*", " ", "\"", "\\", "\t", "\n", "\u0001", "\u007F", "é", "\u202E", "😀", "'"];

    private static readonly Gen<(int Piece, int Mode)[]> Pieces =
        Gen.Select(Gen.Int[0, Alphabet.Length - 1], Gen.Int[0, 4], (piece, mode) => (piece, mode)).Array[0, 24];

    [Fact]
    public void Basic_strings_decode_like_tomlyn_with_offsets_on_their_source()
    {
        Pieces.Sample(pieces => Check(Encode(pieces, multiLine: false)), iter: 2000);
    }

    [Fact]
    public void Multi_line_basic_strings_decode_like_tomlyn_with_offsets_on_their_source()
    {
        Pieces.Sample(pieces => Check(Encode(pieces, multiLine: true)), iter: 2000);
    }

    [Theory]
    [InlineData("'C:\\path\\'")]
    [InlineData("'''\nraw \\n ''quoted'' '''")]
    [InlineData("'''\r\nline1\r\nline2'''")]
    [InlineData("\"\"\"two quotes at the end\"\"\"\"\"")]
    [InlineData("\"\"\"\\\r\n   \t\r\n  x\"\"\"")]
    public void Literal_and_edge_case_tokens_decode_like_tomlyn(string token)
    {
        Check(token);
    }

    private static void Check(string token)
    {
        var document = SyntaxParser.Parse("k = " + token + "\n", "t.toml", validate: true);
        Assert.False(document.HasErrors, token + " -> " + document.Diagnostics);
        var expected = ((StringValueSyntax)document.KeyValues.GetChild(0)!.Value!).Value;

        var (value, offsets) = TomlStringDecoder.Decode(token)!.Value;

        Assert.Equal(expected, value);
        Assert.Equal(value.Length + 1, offsets.Length);
        for (var i = 0; i < value.Length; i++)
        {
            var source = token[offsets[i]];
            Assert.True(source == value[i] || (source == '\\' && token[0] == '"'), $"offset of char {i} in {token}");
            Assert.True(i == 0 || offsets[i] >= offsets[i - 1]);
        }
    }

    // Modes: 0 literal where TOML allows it, 1 short escape, 2 \uXXXX, 3 \UXXXXXXXX, 4 (multi-line) a line
    // continuation before the piece.
    private static string Encode((int Piece, int Mode)[] pieces, bool multiLine)
    {
        var token = new StringBuilder(multiLine ? "\"\"\"\n" : "\"");
        foreach (var (piece, mode) in pieces)
        {
            var text = Alphabet[piece];
            if (mode == 4 && multiLine)
            {
                token.Append("\\  \n \t");
            }

            token.Append(EncodePiece(text, mode, multiLine));
        }

        return token.Append(multiLine ? "\"\"\"" : "\"").ToString();
    }

    private static string EncodePiece(string text, int mode, bool multiLine)
    {
        var code = char.ConvertToUtf32(text, 0);
        var mayBeLiteral = text != "\"" && text != "\\" && (code >= 0x20 || text == "\t" || (multiLine && text == "\n")) && code != 0x7F;
        string? shortEscape = text switch { "\t" => "\\t", "\n" => "\\n", "\"" => "\\\"", "\\" => "\\\\", _ => null };
        return mode switch
        {
            0 or 4 when mayBeLiteral => text,
            1 when shortEscape is not null => shortEscape,
            3 => "\\U" + code.ToString("X8", CultureInfo.InvariantCulture),
            _ when code <= 0xFFFF => "\\u" + code.ToString("x4", CultureInfo.InvariantCulture),
            _ => "\\U" + code.ToString("X8", CultureInfo.InvariantCulture),
        };
    }
}
