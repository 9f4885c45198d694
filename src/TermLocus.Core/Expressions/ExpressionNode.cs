namespace TermLocus.Core.Expressions;

/// <summary>
/// A node of a parsed expression. Sums and products are n-ary, so the tree is only as deep as the text's
/// nesting of parentheses, unary minus and powers (which the parser limits), never as long as a chain of terms.
/// </summary>
/// <param name="Start">Offset of the node's first character in the expression text.</param>
/// <param name="End">Offset one past its last character.</param>
internal abstract record ExpressionNode(int Start, int End)
{
    /// <summary>True when the variable (s or z) occurs anywhere below this node.</summary>
    public abstract bool ContainsVariable { get; }

    /// <summary>Bounds on the degrees of the value's numerator and denominator in the variable.</summary>
    public abstract DegreeBound Degree { get; }
}
