using TermLocus.App.Canvas;

namespace TermLocus.App.Plot;

/// <summary>A drawn plot: one text line per row (empty cells are spaces) and a colouring tag per cell.</summary>
public sealed class RenderedPlane
{
    private readonly CellTag[] tags;

    private RenderedPlane(IReadOnlyList<string> lines, CellTag[] tags, int columns, int rows)
    {
        Lines = lines;
        this.tags = tags;
        Columns = columns;
        Rows = rows;
    }

    /// <summary>Exactly <see cref="Rows"/> strings of <see cref="Columns"/> characters each.</summary>
    public IReadOnlyList<string> Lines { get; }

    /// <summary>Width in cells.</summary>
    public int Columns { get; }

    /// <summary>Height in cells.</summary>
    public int Rows { get; }

    /// <summary>The tag that colours cell (<paramref name="column"/>, <paramref name="row"/>).</summary>
    public CellTag TagAt(int column, int row)
    {
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual((uint)column, (uint)Columns, nameof(column));
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual((uint)row, (uint)Rows, nameof(row));
        return tags[(row * Columns) + column];
    }

    /// <summary>Row <paramref name="row"/> as runs of equally tagged cells, left to right.</summary>
    public IReadOnlyList<TagRun> Runs(int row)
    {
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual((uint)row, (uint)Rows, nameof(row));
        return TagRun.Split(tags.AsSpan(row * Columns, Columns));
    }

    /// <summary>All lines joined with '\n', for printing.</summary>
    public string Text() => string.Join('\n', Lines);

    /// <summary>A snapshot of <paramref name="canvas"/>.</summary>
    public static RenderedPlane From(DotCanvas canvas)
    {
        ArgumentNullException.ThrowIfNull(canvas);
        return new RenderedPlane(canvas.Lines(), canvas.Tags(), canvas.Columns, canvas.Rows);
    }
}
