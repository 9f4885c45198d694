namespace TermLocus.App.Canvas;

/// <summary>How a <see cref="DotCanvas"/> turns dots into characters.</summary>
public enum CanvasSymbols
{
    /// <summary>Unicode braille patterns: 2 × 4 dots per cell, about square dots.</summary>
    Braille,

    /// <summary>Plain ASCII: 2 × 2 dots per cell drawn with characters such as <c>. ' - _ | / \ +</c>.</summary>
    Ascii,
}
