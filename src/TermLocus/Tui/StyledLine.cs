namespace TermLocus.Tui;

/// <summary>A line of presenter text and how to draw it.</summary>
/// <param name="Text">The text, already safe and fitted to the pane width.</param>
/// <param name="Tone">How to draw it.</param>
internal readonly record struct StyledLine(string Text, Tone Tone);
