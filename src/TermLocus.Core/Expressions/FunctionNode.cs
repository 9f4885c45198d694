namespace TermLocus.Core.Expressions;

/// <summary>A function applied to an argument free of the variable.</summary>
internal sealed record FunctionNode(int Start, int End, ScalarFunction Function, ExpressionNode Argument)
    : ExpressionNode(Start, End)
{
    public override bool ContainsVariable => false;

    public override DegreeBound Degree => DegreeBound.Constant;
}
