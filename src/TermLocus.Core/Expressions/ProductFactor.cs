namespace TermLocus.Core.Expressions;

/// <summary>One factor of a <see cref="ProductNode"/>.</summary>
/// <param name="Node">The factor.</param>
/// <param name="Divide">True when the factor follows a slash.</param>
internal readonly record struct ProductFactor(ExpressionNode Node, bool Divide);
