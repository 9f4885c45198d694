namespace TermLocus.Core.Expressions;

/// <summary>Walks a parsed tree with an algebra. Depth is bounded by the parser's nesting limit.</summary>
internal static class ExpressionEvaluator
{
    /// <summary>The value of <paramref name="node"/> in <paramref name="algebra"/>.</summary>
    /// <exception cref="ExpressionEvaluationException">The algebra found a value it cannot form (division by zero, overflow).</exception>
    public static T Evaluate<T>(ExpressionNode node, IExpressionAlgebra<T> algebra) => node switch
    {
        NumberNode n => algebra.Number(n.Value),
        NameNode n => algebra.Parameter(n),
        VariableNode => algebra.Variable(),
        NegateNode n => algebra.Negate(Evaluate(n.Operand, algebra)),
        SumNode n => EvaluateSum(n, algebra),
        ProductNode n => EvaluateProduct(n, algebra),
        PowerNode n => EvaluatePower(n, algebra),
        FunctionNode n => algebra.Apply(n.Function, Evaluate(n.Argument, algebra), n),
        _ => throw new InvalidOperationException($"Unknown expression node {node.GetType().Name}."),
    };

    private static T EvaluateSum<T>(SumNode node, IExpressionAlgebra<T> algebra)
    {
        var acc = Evaluate(node.Terms[0].Node, algebra);
        for (int i = 1; i < node.Terms.Length; i++)
        {
            var term = node.Terms[i];
            var value = Evaluate(term.Node, algebra);
            acc = term.Subtract ? algebra.Subtract(acc, value, node) : algebra.Add(acc, value, node);
        }

        return acc;
    }

    private static T EvaluateProduct<T>(ProductNode node, IExpressionAlgebra<T> algebra)
    {
        var acc = Evaluate(node.Factors[0].Node, algebra);
        for (int i = 1; i < node.Factors.Length; i++)
        {
            var factor = node.Factors[i];
            var value = Evaluate(factor.Node, algebra);
            acc = factor.Divide ? algebra.Divide(acc, value, factor.Node) : algebra.Multiply(acc, value, node);
        }

        return acc;
    }

    private static T EvaluatePower<T>(PowerNode node, IExpressionAlgebra<T> algebra)
    {
        var baseValue = Evaluate(node.Base, algebra);
        return node.WholeExponent is int k
            ? algebra.WholePower(baseValue, k, node)
            : algebra.RealPower(baseValue, Evaluate(node.Exponent, algebra), node);
    }
}
