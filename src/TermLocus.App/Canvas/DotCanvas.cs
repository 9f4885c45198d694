namespace TermLocus.App.Canvas;

/// <summary>
/// A grid of terminal cells, each holding a few dots (braille 2 × 4 or ASCII 2 × 2), an optional glyph that hides
/// the dots (labels, pole markers), and a <see cref="CellTag"/> for colouring. Dot (0, 0) is the top-left dot;
/// x grows right, y grows down. Out-of-range dots and cells are ignored, so callers can draw without bounds checks.
/// The arrays are allocated once; <see cref="Clear"/> lets a view redraw into the same canvas on every key press.
/// </summary>
public sealed class DotCanvas
{
    private readonly byte[] bits;
    private readonly char[] glyphs;
    private readonly CellTag[] dotTags;
    private readonly CellTag[] glyphTags;

    /// <summary>An empty canvas of <paramref name="columns"/> × <paramref name="rows"/> cells (both at least 1).</summary>
    public DotCanvas(int columns, int rows, CanvasSymbols symbols)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(columns, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(rows, 1);
        Columns = columns;
        Rows = rows;
        Symbols = symbols;
        DotsPerColumn = DotCells.DotsPerColumn;
        DotsPerRow = DotCells.DotsPerRow(symbols);
        bits = new byte[columns * rows];
        glyphs = new char[columns * rows];
        dotTags = new CellTag[columns * rows];
        glyphTags = new CellTag[columns * rows];
    }

    /// <summary>Width in cells.</summary>
    public int Columns { get; }

    /// <summary>Height in cells.</summary>
    public int Rows { get; }

    /// <summary>The symbol set chosen at construction.</summary>
    public CanvasSymbols Symbols { get; }

    /// <summary>Dots across one cell.</summary>
    public int DotsPerColumn { get; }

    /// <summary>Dots down one cell.</summary>
    public int DotsPerRow { get; }

    /// <summary>Width in dots.</summary>
    public int DotWidth => Columns * DotsPerColumn;

    /// <summary>Height in dots.</summary>
    public int DotHeight => Rows * DotsPerRow;

    /// <summary>Erases every dot, glyph and tag.</summary>
    public void Clear()
    {
        Array.Clear(bits);
        Array.Clear(glyphs);
        Array.Clear(dotTags);
        Array.Clear(glyphTags);
    }

    /// <summary>Sets dot (<paramref name="x"/>, <paramref name="y"/>); ignored outside the canvas.</summary>
    public void SetDot(int x, int y, CellTag tag)
    {
        if ((uint)x >= (uint)DotWidth || (uint)y >= (uint)DotHeight)
        {
            return;
        }

        int column = x / DotsPerColumn;
        int row = y / DotsPerRow;
        int cell = (row * Columns) + column;
        bits[cell] |= DotCells.Mask(Symbols, x - (column * DotsPerColumn), y - (row * DotsPerRow));
        if (tag.Outranks(dotTags[cell]))
        {
            dotTags[cell] = tag;
        }
    }

    /// <summary>True when dot (<paramref name="x"/>, <paramref name="y"/>) is set; false outside the canvas.</summary>
    public bool IsDotSet(int x, int y)
    {
        if ((uint)x >= (uint)DotWidth || (uint)y >= (uint)DotHeight)
        {
            return false;
        }

        int column = x / DotsPerColumn;
        int row = y / DotsPerRow;
        byte mask = DotCells.Mask(Symbols, x - (column * DotsPerColumn), y - (row * DotsPerRow));
        return (bits[(row * Columns) + column] & mask) != 0;
    }

    /// <summary>
    /// Draws a straight line of dots from (<paramref name="x0"/>, <paramref name="y0"/>) to (<paramref name="x1"/>,
    /// <paramref name="y1"/>) inclusive, with Bresenham's integer algorithm so no dot is allocated or rounded twice.
    /// </summary>
    public void DrawLine(int x0, int y0, int x1, int y1, CellTag tag) => DrawLine(x0, y0, x1, y1, tag, DotPattern.Solid);

    /// <summary>Draws a dashed or dotted line; the pattern restarts at (<paramref name="x0"/>, <paramref name="y0"/>).</summary>
    public void DrawLine(int x0, int y0, int x1, int y1, CellTag tag, DotPattern pattern)
    {
        int phase = 0;
        DrawSegment(x0, y0, x1, y1, tag, pattern, ref phase, skipStart: false);
    }

    /// <summary>
    /// One piece of a polyline: <paramref name="phase"/> carries the dash pattern on from the previous piece, and
    /// <paramref name="skipStart"/> leaves out a start dot already drawn as the previous piece's end, so dotted
    /// curves made of many short pieces keep an even spacing.
    /// </summary>
    internal void DrawSegment(
        int x0, int y0, int x1, int y1, CellTag tag, DotPattern pattern, ref int phase, bool skipStart)
    {
        int dx = Math.Abs(x1 - x0);
        int dy = -Math.Abs(y1 - y0);
        int stepX = x0 < x1 ? 1 : -1;
        int stepY = y0 < y1 ? 1 : -1;
        int error = dx + dy;
        bool skip = skipStart;
        while (true)
        {
            if (!skip)
            {
                if (pattern.Draws(phase))
                {
                    SetDot(x0, y0, tag);
                }

                phase++;
            }

            skip = false;
            if (x0 == x1 && y0 == y1)
            {
                return;
            }

            int doubled = 2 * error;
            if (doubled >= dy)
            {
                error += dy;
                x0 += stepX;
            }

            if (doubled <= dx)
            {
                error += dx;
                y0 += stepY;
            }
        }
    }

    /// <summary>
    /// Puts one character at cell (<paramref name="column"/>, <paramref name="row"/>), hiding that cell's dots.
    /// An existing glyph is replaced only by one whose layer is at least as high. Control and bidi-override
    /// characters are shown as '?' so text from files cannot drive the terminal.
    /// </summary>
    public void PutGlyph(int column, int row, char glyph, CellTag tag)
    {
        if ((uint)column >= (uint)Columns || (uint)row >= (uint)Rows)
        {
            return;
        }

        int cell = (row * Columns) + column;
        if (glyphs[cell] != '\0' && glyphTags[cell].Layer > tag.Layer)
        {
            return;
        }

        glyphs[cell] = SafeCharacter(glyph);
        glyphTags[cell] = tag;
    }

    /// <summary>Writes <paramref name="text"/> left to right from cell (<paramref name="column"/>, <paramref name="row"/>),
    /// clipped at the edges, each character as by <see cref="PutGlyph"/>.</summary>
    public void PutText(int column, int row, string text, CellTag tag)
    {
        ArgumentNullException.ThrowIfNull(text);
        for (int i = 0; i < text.Length; i++)
        {
            PutGlyph(column + i, row, text[i], tag);
        }
    }

    /// <summary>True when any cell of the run of <paramref name="length"/> cells from (<paramref name="column"/>,
    /// <paramref name="row"/>) holds a glyph, or the run leaves the canvas.</summary>
    public bool HasGlyphs(int column, int row, int length)
    {
        if (column < 0 || row < 0 || row >= Rows || column + length > Columns)
        {
            return true;
        }

        int start = (row * Columns) + column;
        return glyphs.AsSpan(start, length).ContainsAnyExcept('\0');
    }

    /// <summary>The tag that colours cell (<paramref name="column"/>, <paramref name="row"/>): the glyph's when it has one,
    /// else the highest-priority layer among its dots, else <see cref="CellTag.None"/>.</summary>
    public CellTag TagAt(int column, int row)
    {
        int cell = (row * Columns) + column;
        return glyphs[cell] != '\0' ? glyphTags[cell] : bits[cell] != 0 ? dotTags[cell] : CellTag.None;
    }

    /// <summary>The character shown in cell (<paramref name="column"/>, <paramref name="row"/>); a space when empty.</summary>
    public char CharAt(int column, int row)
    {
        int cell = (row * Columns) + column;
        return glyphs[cell] != '\0' ? glyphs[cell] : DotCells.Character(Symbols, bits[cell]);
    }

    /// <summary>One string per row, exactly <see cref="Columns"/> characters each; empty cells are spaces.</summary>
    public IReadOnlyList<string> Lines()
    {
        var lines = new string[Rows];
        for (int row = 0; row < Rows; row++)
        {
            lines[row] = string.Create(Columns, (this, row), static (span, state) =>
            {
                for (int column = 0; column < span.Length; column++)
                {
                    span[column] = state.Item1.CharAt(column, state.row);
                }
            });
        }

        return lines;
    }

    /// <summary>Every cell's colouring tag, row by row (<c>tags[row * Columns + column]</c>).</summary>
    public CellTag[] Tags()
    {
        var tags = new CellTag[Columns * Rows];
        for (int row = 0; row < Rows; row++)
        {
            for (int column = 0; column < Columns; column++)
            {
                tags[(row * Columns) + column] = TagAt(column, row);
            }
        }

        return tags;
    }

    private static char SafeCharacter(char glyph) =>
        char.IsControl(glyph) || glyph is >= '\u202A' and <= '\u202E' or >= '\u2066' and <= '\u2069' ? '?' : glyph;
}
