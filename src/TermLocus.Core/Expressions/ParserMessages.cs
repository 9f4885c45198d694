namespace TermLocus.Core.Expressions;

/// <summary>The parser's error messages: what was found, what was expected, and how to write it instead.</summary>
internal static class ParserMessages
{
    /// <summary>The things that may start an operand, for "expected ..." messages.</summary>
    public static string OperandWords(string variable) => $"a number, a parameter name, {variable} or '('";

    /// <summary>Two operands side by side: the message spells out the product with its '*'.</summary>
    public static ExpressionSyntaxException MissingStar(string text, int leftStart, int leftEnd, Token next)
    {
        string left = SourceQuote.Of(text, leftStart, leftEnd, 20);
        string right = next.Kind == TokenKind.OpenParen ? "(...)" : SourceQuote.Of(text, next.Offset, next.End, 20);
        return new ExpressionSyntaxException(
            next.Offset, $"missing '*': multiplication must be written out, write {left}*{right}");
    }

    /// <summary>A token that cannot start an operand where one is needed.</summary>
    public static ExpressionSyntaxException ExpectedOperand(Token token, Token? previous, string variable)
    {
        string expected = OperandWords(variable);
        if (token.Kind == TokenKind.Star && previous is { Kind: TokenKind.Star } star)
        {
            return new ExpressionSyntaxException(star.Offset, "'**' is not an operator: write ^ for a power");
        }

        if (token.Kind == TokenKind.End)
        {
            string after = previous is { } p ? $" after {Describe(p)}" : string.Empty;
            return new ExpressionSyntaxException(token.Offset, $"the expression ends too early: expected {expected}{after}");
        }

        if (token.Kind == TokenKind.Plus)
        {
            return new ExpressionSyntaxException(token.Offset, $"unexpected '+': expected {expected} (there is no unary plus)");
        }

        return new ExpressionSyntaxException(token.Offset, $"expected {expected}, found {Describe(token)}");
    }

    /// <summary>A token as quoted in messages.</summary>
    public static string Describe(Token token) =>
        token.Kind == TokenKind.End ? "the end" : $"'{SourceQuote.Shorten(token.Text, 20)}'";

    /// <summary>The message for a degree above <see cref="ExpressionLimits.MaxDegree"/>.</summary>
    public static string DegreeTooHigh(long degree) =>
        $"degree too high: this would reach degree {degree} (at most {ExpressionLimits.MaxDegree})";
}
