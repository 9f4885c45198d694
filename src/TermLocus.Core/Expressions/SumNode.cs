using System.Collections.Immutable;

namespace TermLocus.Core.Expressions;

/// <summary>A chain of terms joined by + and -, evaluated left to right. <c>Terms</c>: At least two terms; the first is never subtracted.</summary>
internal sealed record SumNode(int Start, int End, ImmutableArray<SumTerm> Terms, bool HasVariable, DegreeBound Bound)
    : ExpressionNode(Start, End)
{
    public override bool ContainsVariable => HasVariable;

    public override DegreeBound Degree => Bound;
}
