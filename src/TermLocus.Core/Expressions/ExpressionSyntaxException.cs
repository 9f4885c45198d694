namespace TermLocus.Core.Expressions;

/// <summary>
/// A problem found while reading or evaluating an expression, located by character offset into the expression
/// text. Never escapes the Expressions namespace: <see cref="ParsedExpression"/> and the parser turn it into a
/// <see cref="Plants.PlantFileException"/> with file, line and column.
/// </summary>
internal sealed class ExpressionSyntaxException : Exception
{
    public ExpressionSyntaxException(int offset, string message)
        : base(message) => Offset = offset;

    /// <summary>Offset of the offending character in the expression text.</summary>
    public int Offset { get; }
}
