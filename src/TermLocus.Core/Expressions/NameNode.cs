namespace TermLocus.Core.Expressions;

/// <summary>A use of a parameter. <c>Name</c>: The parameter's name. <c>NameIndex</c>: Index of the name in <see cref="ParsedExpression.DistinctNames"/>.</summary>
internal sealed record NameNode(int Start, int End, string Name, int NameIndex) : ExpressionNode(Start, End)
{
    public override bool ContainsVariable => false;

    public override DegreeBound Degree => DegreeBound.Constant;
}
