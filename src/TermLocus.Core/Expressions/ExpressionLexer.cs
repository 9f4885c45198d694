using System.Globalization;

namespace TermLocus.Core.Expressions;

/// <summary>Splits expression text into tokens. Whitespace (including line breaks) separates tokens.</summary>
internal static class ExpressionLexer
{
    /// <summary>All tokens of <paramref name="text"/>, ending with one <see cref="TokenKind.End"/> token.</summary>
    /// <exception cref="ExpressionSyntaxException">An unknown character or a malformed number.</exception>
    public static List<Token> Tokenize(string text)
    {
        var tokens = new List<Token>();
        int i = 0;
        while (i < text.Length)
        {
            char c = text[i];
            if (char.IsWhiteSpace(c))
            {
                i++;
            }
            else if (char.IsAsciiDigit(c) || (c == '.' && i + 1 < text.Length && char.IsAsciiDigit(text[i + 1])))
            {
                tokens.Add(ReadNumber(text, i));
                i = tokens[^1].End;
            }
            else if (char.IsAsciiLetter(c) || c == '_')
            {
                int start = i;
                while (i < text.Length && (char.IsAsciiLetterOrDigit(text[i]) || text[i] == '_'))
                {
                    i++;
                }

                tokens.Add(new Token(TokenKind.Name, start, i - start, text[start..i], 0.0));
            }
            else
            {
                var kind = OperatorKind(c, i);
                tokens.Add(new Token(kind, i, 1, OperatorText(kind), 0.0));
                i++;
            }
        }

        tokens.Add(new Token(TokenKind.End, text.Length, 0, string.Empty, 0.0));
        return tokens;
    }

    private static TokenKind OperatorKind(char c, int offset) => c switch
    {
        '+' => TokenKind.Plus,
        '-' => TokenKind.Minus,
        '*' => TokenKind.Star,
        '/' => TokenKind.Slash,
        '^' => TokenKind.Caret,
        '(' => TokenKind.OpenParen,
        ')' => TokenKind.CloseParen,
        _ => throw new ExpressionSyntaxException(offset, UnexpectedCharacter(c)),
    };

    private static string OperatorText(TokenKind kind) => kind switch
    {
        TokenKind.Plus => "+",
        TokenKind.Minus => "-",
        TokenKind.Star => "*",
        TokenKind.Slash => "/",
        TokenKind.Caret => "^",
        TokenKind.OpenParen => "(",
        _ => ")",
    };

    private static string UnexpectedCharacter(char c) => c switch
    {
        '\u00D7' or '\u00B7' or '\u22C5' => $"unexpected character {Describe(c)}: write '*' to multiply",
        '\u2212' or '\u2013' => $"unexpected character {Describe(c)}: write '-' to subtract",
        '\u00F7' => $"unexpected character {Describe(c)}: write '/' to divide",
        '[' or '{' => $"unexpected character {Describe(c)}: group with '(' and ')'",
        ',' => "unexpected character ',': write numbers with a decimal point, e.g. 0.5",
        _ => $"unexpected character {Describe(c)}: expected a number, a name, + - * / ^ ( or )",
    };

    /// <summary>A character as it can be printed safely on a terminal: quoted if plain ASCII, else its code point.</summary>
    internal static string Describe(char c) =>
        c is >= ' ' and <= '~' ? $"'{c}'" : $"U+{(int)c:X4}";

    private static Token ReadNumber(string text, int start)
    {
        int i = SkipDigits(text, start);
        if (i < text.Length && text[i] == '.')
        {
            int afterPoint = SkipDigits(text, i + 1);
            if (afterPoint == i + 1)
            {
                throw new ExpressionSyntaxException(i + 1, "expected a digit after the decimal point");
            }

            i = afterPoint;
        }

        i = SkipExponent(text, i);
        var span = text.AsSpan(start, i - start);
        double value = double.Parse(span, NumberStyles.AllowDecimalPoint | NumberStyles.AllowExponent, CultureInfo.InvariantCulture);
        if (!double.IsFinite(value))
        {
            throw new ExpressionSyntaxException(start, $"number {span} is too large (not a finite double)");
        }

        return new Token(TokenKind.Number, start, i - start, span.ToString(), value);
    }

    // An 'e' only starts an exponent when digits follow (optionally after a sign); otherwise it is left for the
    // parser, which then reports the missing '*' of e.g. "2e".
    private static int SkipExponent(string text, int i)
    {
        if (i >= text.Length || (text[i] != 'e' && text[i] != 'E'))
        {
            return i;
        }

        int j = i + 1;
        if (j < text.Length && (text[j] == '+' || text[j] == '-'))
        {
            j++;
        }

        int end = SkipDigits(text, j);
        return end > j ? end : i;
    }

    private static int SkipDigits(string text, int i)
    {
        while (i < text.Length && char.IsAsciiDigit(text[i]))
        {
            i++;
        }

        return i;
    }
}
