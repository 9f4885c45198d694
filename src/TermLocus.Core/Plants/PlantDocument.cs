using System.Collections.Immutable;

namespace TermLocus.Core.Plants;

/// <summary>
/// A plant file as loaded from disk: its exact bytes and their SHA-256 (to detect edits made behind our back
/// before saving), how it encodes text (BOM, newline style), the decoded text and the validated <see cref="Plant"/>.
/// </summary>
/// <param name="Path">The file as the user named it.</param>
/// <param name="Bytes">The file's bytes exactly as read.</param>
/// <param name="Sha256">SHA-256 of <see cref="Bytes"/> (32 bytes).</param>
/// <param name="HasBom">True when the file starts with a UTF-8 byte order mark (kept when saving).</param>
/// <param name="NewLine">"\r\n" when the file's first line ends that way, else "\n"; used for text added on save.</param>
/// <param name="Text">The decoded text without the BOM.</param>
/// <param name="Plant">The validated plant.</param>
public sealed record PlantDocument(
    string Path,
    ImmutableArray<byte> Bytes,
    ImmutableArray<byte> Sha256,
    bool HasBom,
    string NewLine,
    string Text,
    Plant Plant)
{
    /// <summary>The newline style of <paramref name="text"/>: "\r\n" when its first line break is CRLF, else "\n".</summary>
    public static string DetectNewLine(string text)
    {
        var first = text.IndexOf('\n', StringComparison.Ordinal);
        return first > 0 && text[first - 1] == '\r' ? "\r\n" : "\n";
    }
}
