namespace TermLocus.Core.Expressions;

/// <summary>One term of a <see cref="SumNode"/>.</summary>
/// <param name="Node">The term.</param>
/// <param name="Subtract">True when the term follows a minus sign.</param>
internal readonly record struct SumTerm(ExpressionNode Node, bool Subtract);
