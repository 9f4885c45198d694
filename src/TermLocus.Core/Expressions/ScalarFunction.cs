namespace TermLocus.Core.Expressions;

/// <summary>The functions an expression may apply to a sub-expression free of the variable.</summary>
internal enum ScalarFunction
{
    /// <summary>Square root; argument must be &gt;= 0.</summary>
    Sqrt,

    /// <summary>e to the power of the argument.</summary>
    Exp,

    /// <summary>Natural logarithm; argument must be &gt; 0.</summary>
    Ln,

    /// <summary>Absolute value.</summary>
    Abs,
}
