namespace TermLocus.Core.Expressions;

/// <summary>One token: its kind, where it stands in the expression text, and its value for numbers.</summary>
/// <param name="Kind">The kind of token.</param>
/// <param name="Offset">Index of its first character in the expression text.</param>
/// <param name="Length">Number of characters (0 for <see cref="TokenKind.End"/>).</param>
/// <param name="Text">The characters themselves.</param>
/// <param name="Value">The number's value for <see cref="TokenKind.Number"/>, else 0.</param>
internal readonly record struct Token(TokenKind Kind, int Offset, int Length, string Text, double Value)
{
    /// <summary>Index one past its last character.</summary>
    public int End => Offset + Length;
}
