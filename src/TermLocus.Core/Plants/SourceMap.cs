namespace TermLocus.Core.Plants;

/// <summary>
/// Turns 0-based UTF-16 offsets into a text into 1-based line and column positions. A line ends after each
/// <c>\n</c> (so <c>\r\n</c> counts once); columns count UTF-16 code units, tabs as one.
/// </summary>
internal sealed class SourceMap
{
    private readonly int[] lineStarts;

    /// <summary>Indexes the line starts of <paramref name="text"/>.</summary>
    public SourceMap(string text)
    {
        var starts = new List<int> { 0 };
        for (var i = 0; i < text.Length; i++)
        {
            if (text[i] == '\n')
            {
                starts.Add(i + 1);
            }
        }

        lineStarts = [.. starts];
        Length = text.Length;
    }

    /// <summary>Length of the mapped text in UTF-16 code units.</summary>
    public int Length { get; }

    /// <summary>The position of <paramref name="offset"/>, clamped to [0, Length].</summary>
    public SourcePosition PositionAt(int offset)
    {
        offset = Math.Clamp(offset, 0, Length);
        var index = Array.BinarySearch(lineStarts, offset);
        var line = index >= 0 ? index : ~index - 1;
        return new SourcePosition(line + 1, offset - lineStarts[line] + 1);
    }
}
