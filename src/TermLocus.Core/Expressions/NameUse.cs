namespace TermLocus.Core.Expressions;

/// <summary>One use of a parameter name inside an expression.</summary>
/// <param name="Name">The name as written (<c>[A-Za-z_][A-Za-z0-9_]*</c>).</param>
/// <param name="Offset">Index of its first character in the expression text (0-based, UTF-16 code units).</param>
public readonly record struct NameUse(string Name, int Offset);
