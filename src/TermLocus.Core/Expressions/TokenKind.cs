namespace TermLocus.Core.Expressions;

/// <summary>Kinds of token in the plant-file expression language.</summary>
internal enum TokenKind
{
    Number,
    Name,
    Plus,
    Minus,
    Star,
    Slash,
    Caret,
    OpenParen,
    CloseParen,
    End,
}
