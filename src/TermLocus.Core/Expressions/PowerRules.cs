namespace TermLocus.Core.Expressions;

/// <summary>
/// What a power may be: a base containing the variable takes a written whole exponent from 0 up to the degree cap;
/// a base free of it takes any exponent free of it.
/// </summary>
internal static class PowerRules
{
    /// <summary>Builds <c>baseNode ^ exponent</c> or throws a located error.</summary>
    /// <exception cref="ExpressionSyntaxException">The exponent breaks one of the rules above.</exception>
    public static PowerNode Build(string text, ExpressionNode baseNode, ExpressionNode exponent, string variable)
    {
        if (exponent.ContainsVariable)
        {
            throw new ExpressionSyntaxException(exponent.Start, $"an exponent must be free of {variable}");
        }

        long? whole = WholeLiteral(exponent);
        if (!baseNode.ContainsVariable)
        {
            int? kept = whole is long n && Math.Abs(n) <= ExpressionLimits.MaxWholeExponent ? (int)n : null;
            return new PowerNode(baseNode.Start, exponent.End, baseNode, exponent, kept);
        }

        if (whole is not long k)
        {
            string written = SourceQuote.Of(text, exponent.Start, exponent.End, 20);
            string what = IsLiteral(exponent) ? written : $"'{written}', which is not a written number";
            throw new ExpressionSyntaxException(
                exponent.Start,
                $"the power of an expression containing {variable} must be a whole number from 0 to {ExpressionLimits.MaxDegree}, not {what}");
        }

        if (k < 0)
        {
            throw new ExpressionSyntaxException(
                exponent.Start,
                $"negative power of an expression containing {variable}: divide instead, e.g. 1/{variable}^2 rather than {variable}^-2");
        }

        long degree = k * baseNode.Degree.Max;
        if (k > ExpressionLimits.MaxDegree || degree > ExpressionLimits.MaxDegree)
        {
            throw new ExpressionSyntaxException(exponent.Start, ParserMessages.DegreeTooHigh(Math.Max(k, degree)));
        }

        return new PowerNode(baseNode.Start, exponent.End, baseNode, exponent, (int)k);
    }

    private static bool IsLiteral(ExpressionNode node) => node switch
    {
        NumberNode { IsLiteral: true } => true,
        NegateNode { Operand: NumberNode { IsLiteral: true } } => true,
        _ => false,
    };

    // Up to 1e15 a double holds every whole number exactly, so the cast cannot round.
    private static long? WholeLiteral(ExpressionNode node) => node switch
    {
        NumberNode { IsLiteral: true, Value: var v } when v == Math.Floor(v) && v <= 1e15 => (long)v,
        NegateNode { Operand: NumberNode { IsLiteral: true, Value: var v } } when v == Math.Floor(v) && v <= 1e15 => -(long)v,
        _ => null,
    };
}
