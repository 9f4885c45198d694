namespace TermLocus.Core.Expressions;

/// <summary>
/// Limits that keep hostile or mistaken expressions from running away with time or stack.
/// </summary>
public static class ExpressionLimits
{
    /// <summary>
    /// Highest degree in the variable an expression (numerator or denominator, counted without cancellation)
    /// and a whole loop may reach. <c>s^201</c> is rejected as "degree too high".
    /// </summary>
    public const int MaxDegree = 200;

    /// <summary>
    /// Deepest nesting of parentheses, unary minus, powers and function calls. Deeper text is rejected
    /// with a located message instead of overflowing the stack.
    /// </summary>
    public const int MaxNestingDepth = 200;

    /// <summary>
    /// Largest magnitude of a whole-number exponent on a sub-expression free of the variable that is kept as an
    /// exact product (<c>K^2</c> is K·K); larger exponents are computed as a real power.
    /// </summary>
    public const int MaxWholeExponent = 200;
}
