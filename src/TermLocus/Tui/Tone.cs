namespace TermLocus.Tui;

/// <summary>How a line of text is drawn; the palette turns a tone into colours or, without colour, into styles.</summary>
internal enum Tone
{
    /// <summary>Ordinary text.</summary>
    Normal,

    /// <summary>Less important text (hints, hidden-row notes).</summary>
    Dim,

    /// <summary>A heading (table header, help section).</summary>
    Heading,

    /// <summary>The selected row.</summary>
    Selected,

    /// <summary>Good news: all specs met.</summary>
    Good,

    /// <summary>A violated spec or unstable pole (always also marked by a glyph and words).</summary>
    Bad,

    /// <summary>The selected row, which also violates a spec.</summary>
    SelectedBad,

    /// <summary>A warning message.</summary>
    Warning,

    /// <summary>An error message.</summary>
    Error,
}
