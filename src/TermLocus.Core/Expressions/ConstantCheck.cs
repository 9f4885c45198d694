namespace TermLocus.Core.Expressions;

/// <summary>
/// Evaluates, once at parse time, every largest part of an expression that uses neither a parameter nor the
/// variable, so that <c>ln(-1)</c>, <c>1e200*1e200</c> or a division by a constant zero is reported when the file is
/// loaded rather than when the loop is first formed.
/// </summary>
internal static class ConstantCheck
{
    private static readonly NumericAlgebra NoParameters = new([], null);

    /// <summary>Checks the tree below <paramref name="root"/>.</summary>
    /// <exception cref="ExpressionEvaluationException">A constant part has no finite real value, or divides by zero.</exception>
    public static void Run(ExpressionNode root)
    {
        if (IsConstant(root))
        {
            ExpressionEvaluator.Evaluate(root, NoParameters);
        }
    }

    // Post-order: a constant node is left for its parent to evaluate as part of a larger constant; a node that is not
    // constant evaluates its constant children itself, so every constant part is evaluated exactly once.
    private static bool IsConstant(ExpressionNode node)
    {
        switch (node)
        {
            case NumberNode:
                return true;
            case NameNode or VariableNode:
                return false;
            case NegateNode n:
                return IsConstant(n.Operand);
            case FunctionNode f:
                return IsConstant(f.Argument);
            case PowerNode p:
                return Combine([p.Base, p.Exponent], divides: null);
            case SumNode s:
                return Combine(s.Terms.Select(t => t.Node).ToArray(), divides: null);
            case ProductNode p:
                return Combine(p.Factors.Select(f => f.Node).ToArray(), p.Factors.Select(f => f.Divide).ToArray());
            default:
                return false;
        }
    }

    private static bool Combine(ExpressionNode[] children, bool[]? divides)
    {
        var constant = children.Select(IsConstant).ToArray();
        if (constant.All(c => c))
        {
            return true;
        }

        for (int i = 0; i < children.Length; i++)
        {
            if (!constant[i])
            {
                continue;
            }

            var value = ExpressionEvaluator.Evaluate(children[i], NoParameters);
            if (divides is not null && divides[i] && value.Numerator.IsZero)
            {
                throw ExpressionEvaluationException.DivisionByZero(children[i]);
            }
        }

        return false;
    }
}
