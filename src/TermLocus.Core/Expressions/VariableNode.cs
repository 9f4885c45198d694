namespace TermLocus.Core.Expressions;

/// <summary>The transform variable (s, or z in a z-domain expression).</summary>
internal sealed record VariableNode(int Start, int End) : ExpressionNode(Start, End)
{
    public override bool ContainsVariable => true;

    public override DegreeBound Degree => DegreeBound.Variable;
}
