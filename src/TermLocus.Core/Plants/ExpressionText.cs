using System.Collections.Immutable;

namespace TermLocus.Core.Plants;

/// <summary>
/// An expression string taken from a plant file, with the file position of each of its characters so that
/// an error at character <c>i</c> of <see cref="Text"/> can be reported at its true line and column
/// (escapes and multi-line strings make the mapping non-trivial).
/// </summary>
/// <param name="Key">The TOML key the expression came from (e.g. <c>plant</c>).</param>
/// <param name="Text">The decoded string value.</param>
/// <param name="Positions">Position of each character of <see cref="Text"/>, plus one past the end; same length as Text + 1.</param>
public sealed record ExpressionText(string Key, string Text, ImmutableArray<SourcePosition> Positions)
{
    /// <summary>The file position of character <paramref name="offset"/> (clamped to [0, Text.Length]).</summary>
    public SourcePosition PositionOf(int offset) =>
        Positions.IsDefaultOrEmpty ? new SourcePosition(1, 1) : Positions[Math.Clamp(offset, 0, Positions.Length - 1)];

    /// <summary>An expression not read from a file (tests, the command line): positions are 1-based columns on line 1.</summary>
    public static ExpressionText Inline(string key, string text) =>
        new(key, text, Enumerable.Range(1, text.Length + 1).Select(c => new SourcePosition(1, c)).ToImmutableArray());
}
