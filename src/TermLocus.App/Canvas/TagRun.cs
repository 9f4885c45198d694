namespace TermLocus.App.Canvas;

/// <summary>A stretch of <paramref name="Length"/> neighbouring cells in one row that share a tag, so a view can set
/// a colour once per run instead of once per cell.</summary>
/// <param name="Start">First column of the run.</param>
/// <param name="Length">Number of cells, at least 1.</param>
/// <param name="Tag">The tag shared by every cell of the run.</param>
public readonly record struct TagRun(int Start, int Length, CellTag Tag)
{
    /// <summary>Splits one row of tags into maximal runs, left to right, covering the whole row.</summary>
    public static IReadOnlyList<TagRun> Split(ReadOnlySpan<CellTag> row)
    {
        var runs = new List<TagRun>();
        int start = 0;
        for (int i = 1; i <= row.Length; i++)
        {
            if (i == row.Length || row[i] != row[start])
            {
                runs.Add(new TagRun(start, i - start, row[start]));
                start = i;
            }
        }

        return runs;
    }
}
