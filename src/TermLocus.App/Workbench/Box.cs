namespace TermLocus.App.Workbench;

/// <summary>A rectangle of terminal cells: column, row, width, height (all in cells, width/height &gt;= 0).</summary>
/// <param name="X">Left column.</param>
/// <param name="Y">Top row.</param>
/// <param name="Width">Columns.</param>
/// <param name="Height">Rows.</param>
public readonly record struct Box(int X, int Y, int Width, int Height)
{
    /// <summary>No area: the pane is not shown.</summary>
    public static Box Empty => default;

    /// <summary>True when the box has no cells.</summary>
    public bool IsEmpty => Width <= 0 || Height <= 0;

    /// <summary>A box of <paramref name="width"/> × <paramref name="height"/> centred in <paramref name="outer"/> (clipped to it).</summary>
    public static Box Centred(Box outer, int width, int height)
    {
        int w = Math.Min(width, outer.Width);
        int h = Math.Min(height, outer.Height);
        return new Box(outer.X + ((outer.Width - w) / 2), outer.Y + ((outer.Height - h) / 2), w, h);
    }
}
