namespace TermLocus.Core.Expressions;

/// <summary>
/// What an expression's value is made of. The same tree is evaluated with plain numbers (NumericAlgebra)
/// and with the swept parameter kept symbolic (SweptAlgebra); both form fractions by the same rules,
/// so their results agree.
/// </summary>
/// <typeparam name="T">The value type.</typeparam>
internal interface IExpressionAlgebra<T>
{
    T Number(double value);

    T Parameter(NameNode site);

    T Variable();

    T Negate(T a);

    T Add(T a, T b, ExpressionNode site);

    T Subtract(T a, T b, ExpressionNode site);

    T Multiply(T a, T b, ExpressionNode site);

    /// <summary>a / b; <paramref name="divisor"/> is the node of b, blamed when b is zero.</summary>
    T Divide(T a, T b, ExpressionNode divisor);

    /// <summary>A whole power (negative only for values free of the variable).</summary>
    T WholePower(T a, int exponent, PowerNode site);

    /// <summary>A real power of a value free of the variable.</summary>
    T RealPower(T a, T b, PowerNode site);

    /// <summary>A function of a value free of the variable.</summary>
    T Apply(ScalarFunction function, T a, FunctionNode site);
}
