namespace TermLocus.Core.Expressions;

/// <summary>A number literal, or the constant <c>pi</c>. <c>Value</c>: The finite value. <c>IsLiteral</c>: True for a written number, false for <c>pi</c>.</summary>
internal sealed record NumberNode(int Start, int End, double Value, bool IsLiteral) : ExpressionNode(Start, End)
{
    public override bool ContainsVariable => false;

    public override DegreeBound Degree => DegreeBound.Constant;
}
