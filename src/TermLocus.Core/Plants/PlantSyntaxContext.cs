using System.Globalization;
using Tomlyn.Syntax;

namespace TermLocus.Core.Plants;

/// <summary>
/// What every part of the plant-file reader shares: the file name for messages, the text, and how to turn a
/// syntax node into a located <see cref="PlantFileException"/>.
/// </summary>
internal sealed class PlantSyntaxContext(string path, string text)
{
    /// <summary>The file as the user named it.</summary>
    public string Path { get; } = path;

    /// <summary>The text that was parsed (BOM removed).</summary>
    public string Text { get; } = text;

    /// <summary>Offsets to positions.</summary>
    public SourceMap Map { get; } = new(text);

    /// <summary>The position of the first character of <paramref name="node"/> (its trivia excluded).</summary>
    public SourcePosition PositionOf(SyntaxNode node) => Map.PositionAt(node.Span.Start.Offset);

    /// <summary>A located error at <paramref name="node"/>.</summary>
    public PlantFileException Fail(SyntaxNode node, string message) => Fail(PositionOf(node), message);

    /// <summary>A located error at <paramref name="position"/>.</summary>
    public PlantFileException Fail(SourcePosition position, string message) =>
        new(new PlantFileError(Path, position, message));

    /// <summary>"line:column" of a node, for messages that refer to an earlier place.</summary>
    public string Where(SyntaxNode node)
    {
        var p = PositionOf(node);
        return string.Create(CultureInfo.InvariantCulture, $"{p.Line}:{p.Column}");
    }

    /// <summary>A number as the file would show it, in the invariant culture (shortest round-trip form).</summary>
    public static string Show(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
