using TermLocus.App.Canvas;

namespace TermLocus.App.Tests.Canvas;

public class DotCanvasBrailleTests
{
    private static readonly CellTag Branch0 = CellTag.Branch(0);

    // Unicode Braille Patterns block (U+2800..U+28FF): dot n sets bit n-1; dots 1-2-3 run down the left column,
    // 4-5-6 down the right, 7 and 8 are the bottom row (The Unicode Standard, ch. 21 "Braille"; from memory).
    [Theory]
    [InlineData(0, 0, '\u2801')] // dot 1
    [InlineData(0, 1, '\u2802')] // dot 2
    [InlineData(0, 2, '\u2804')] // dot 3
    [InlineData(1, 0, '\u2808')] // dot 4
    [InlineData(1, 1, '\u2810')] // dot 5
    [InlineData(1, 2, '\u2820')] // dot 6
    [InlineData(0, 3, '\u2840')] // dot 7
    [InlineData(1, 3, '\u2880')] // dot 8
    public void A_single_dot_sets_its_braille_bit(int x, int y, char expected)
    {
        var canvas = new DotCanvas(1, 1, CanvasSymbols.Braille);

        canvas.SetDot(x, y, Branch0);

        Assert.Equal(expected.ToString(), canvas.Lines()[0]);
    }

    [Fact]
    public void All_eight_dots_make_the_full_cell()
    {
        var canvas = new DotCanvas(1, 1, CanvasSymbols.Braille);
        for (int y = 0; y < 4; y++)
        {
            for (int x = 0; x < 2; x++)
            {
                canvas.SetDot(x, y, Branch0);
            }
        }

        Assert.Equal("\u28FF", canvas.Lines()[0]);
    }

    [Fact]
    public void Empty_cells_are_spaces_never_the_blank_braille_pattern()
    {
        var canvas = new DotCanvas(5, 3, CanvasSymbols.Braille);
        canvas.SetDot(4, 5, Branch0);

        IReadOnlyList<string> lines = canvas.Lines();

        Assert.Equal(["     ", "  ⠂  ", "     "], lines);
        Assert.DoesNotContain(lines, line => line.Contains('\u2800', StringComparison.Ordinal));
    }

    [Fact]
    public void A_horizontal_line_on_the_top_dot_row_uses_dots_1_and_4()
    {
        var canvas = new DotCanvas(4, 1, CanvasSymbols.Braille);

        canvas.DrawLine(0, 0, 7, 0, Branch0);

        Assert.Equal("⠉⠉⠉⠉", canvas.Lines()[0]);
    }

    [Fact]
    public void A_horizontal_line_on_the_bottom_dot_row_uses_dots_7_and_8()
    {
        var canvas = new DotCanvas(3, 1, CanvasSymbols.Braille);

        canvas.DrawLine(5, 3, 0, 3, Branch0);

        Assert.Equal("⣀⣀⣀", canvas.Lines()[0]);
    }

    [Fact]
    public void A_vertical_line_fills_the_left_column_of_each_cell()
    {
        var canvas = new DotCanvas(1, 2, CanvasSymbols.Braille);

        canvas.DrawLine(0, 0, 0, 7, Branch0);

        Assert.Equal(["⡇", "⡇"], canvas.Lines());
    }

    [Fact]
    public void A_diagonal_steps_one_dot_right_per_dot_down()
    {
        var canvas = new DotCanvas(2, 1, CanvasSymbols.Braille);

        canvas.DrawLine(0, 0, 3, 3, Branch0);

        // Cell 0: dots (0,0) and (1,1) = dots 1 and 5; cell 1: (2,2) and (3,3) = dots 3 and 8.
        Assert.Equal("⠑⢄", canvas.Lines()[0]);
    }

    [Fact]
    public void A_sparse_pattern_draws_every_third_dot()
    {
        var canvas = new DotCanvas(5, 1, CanvasSymbols.Braille);

        canvas.DrawLine(0, 0, 9, 0, Branch0, DotPattern.Sparse);

        int[] drawn = Enumerable.Range(0, 10).Where(x => canvas.IsDotSet(x, 0)).ToArray();
        Assert.Equal([0, 3, 6, 9], drawn);
    }

    [Fact]
    public void Dots_outside_the_canvas_are_ignored()
    {
        var canvas = new DotCanvas(2, 1, CanvasSymbols.Braille);

        canvas.SetDot(-1, 0, Branch0);
        canvas.SetDot(4, 0, Branch0);
        canvas.SetDot(0, 4, Branch0);
        canvas.DrawLine(-10, 1, 10, 1, Branch0);

        Assert.Equal("⠒⠒", canvas.Lines()[0]);
    }

    [Fact]
    public void Clear_erases_dots_glyphs_and_tags()
    {
        var canvas = new DotCanvas(2, 1, CanvasSymbols.Braille);
        canvas.SetDot(0, 0, Branch0);
        canvas.PutGlyph(1, 0, 'x', new CellTag(CellLayer.Label));

        canvas.Clear();

        Assert.Equal("  ", canvas.Lines()[0]);
        Assert.Equal(CellTag.None, canvas.TagAt(0, 0));
        Assert.Equal(CellTag.None, canvas.TagAt(1, 0));
    }
}
