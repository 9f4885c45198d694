namespace TermLocus.Core.Expressions;

/// <summary>Unary minus.</summary>
internal sealed record NegateNode(int Start, int End, ExpressionNode Operand) : ExpressionNode(Start, End)
{
    public override bool ContainsVariable => Operand.ContainsVariable;

    public override DegreeBound Degree => Operand.Degree;
}
