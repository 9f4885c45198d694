namespace TermLocus.Core.Expressions;

/// <summary>
/// A value an expression cannot take for the given parameter values (division by zero, a result that is not a
/// finite real number). The message is <c>Prefix 'quoted part of the text' Suffix</c>;
/// <see cref="ParsedExpression"/> fills in the quote and the file position.
/// </summary>
internal sealed class ExpressionEvaluationException : Exception
{
    public ExpressionEvaluationException(ExpressionNode site, string prefix, string suffix)
        : base(prefix + "..." + suffix)
    {
        Site = site;
        Prefix = prefix;
        Suffix = suffix;
    }

    /// <summary>The part of the expression to blame.</summary>
    public ExpressionNode Site { get; }

    /// <summary>Text before the quote.</summary>
    public string Prefix { get; }

    /// <summary>Text after the quote.</summary>
    public string Suffix { get; }

    /// <summary>Throws for a value that is not finite, naming infinity or NaN.</summary>
    public static ExpressionEvaluationException NotFinite(ExpressionNode site, double value) =>
        new(site, string.Empty, double.IsNaN(value)
            ? " is not a real number for these parameter values"
            : " is too large (not a finite number) for these parameter values");

    /// <summary>Division by a value that is zero.</summary>
    public static ExpressionEvaluationException DivisionByZero(ExpressionNode divisor) =>
        new(divisor, "division by zero: ", " is 0 for these parameter values");
}
