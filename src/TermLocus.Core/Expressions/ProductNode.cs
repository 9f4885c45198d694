using System.Collections.Immutable;

namespace TermLocus.Core.Expressions;

/// <summary>A chain of factors joined by * and /, evaluated left to right. <c>Factors</c>: At least two factors; the first is never a divisor.</summary>
internal sealed record ProductNode(int Start, int End, ImmutableArray<ProductFactor> Factors, bool HasVariable, DegreeBound Bound)
    : ExpressionNode(Start, End)
{
    public override bool ContainsVariable => HasVariable;

    public override DegreeBound Degree => Bound;
}
