using CsCheck;
using TermLocus.App.Canvas;

namespace TermLocus.App.Tests.Canvas;

public class DotCanvasTagTests
{
    [Fact]
    public void The_higher_layer_colours_a_shared_cell_whatever_the_drawing_order()
    {
        var first = new DotCanvas(1, 1, CanvasSymbols.Braille);
        var second = new DotCanvas(1, 1, CanvasSymbols.Braille);

        first.SetDot(0, 0, new CellTag(CellLayer.Axis));
        first.SetDot(1, 1, CellTag.Branch(2));
        second.SetDot(1, 1, CellTag.Branch(2));
        second.SetDot(0, 0, new CellTag(CellLayer.Axis));

        Assert.Equal(CellTag.Branch(2), first.TagAt(0, 0));
        Assert.Equal(CellTag.Branch(2), second.TagAt(0, 0));
        Assert.Equal(first.Lines(), second.Lines());
    }

    [Fact]
    public void A_glyph_hides_the_dots_and_takes_the_cell_tag()
    {
        var canvas = new DotCanvas(2, 1, CanvasSymbols.Braille);
        canvas.DrawLine(0, 0, 3, 0, CellTag.Branch(0));

        canvas.PutGlyph(1, 0, '×', new CellTag(CellLayer.OpenLoopPole));

        Assert.Equal("⠉×", canvas.Lines()[0]);
        Assert.Equal(new CellTag(CellLayer.OpenLoopPole), canvas.TagAt(1, 0));
        Assert.Equal(CellTag.Branch(0), canvas.TagAt(0, 0));
    }

    [Fact]
    public void A_lower_layer_glyph_does_not_replace_a_higher_one()
    {
        var canvas = new DotCanvas(3, 1, CanvasSymbols.Braille);
        canvas.PutGlyph(1, 0, '●', new CellTag(CellLayer.CurrentPole));

        canvas.PutText(0, 0, "-10", new CellTag(CellLayer.Label));
        canvas.PutGlyph(2, 0, '▲', new CellTag(CellLayer.CurrentPoleViolating));

        Assert.Equal("-●▲", canvas.Lines()[0]);
        Assert.Equal(new CellTag(CellLayer.Label), canvas.TagAt(0, 0));
        Assert.Equal(new CellTag(CellLayer.CurrentPoleViolating), canvas.TagAt(2, 0));
    }

    [Fact]
    public void Control_and_bidi_characters_never_reach_the_screen()
    {
        var canvas = new DotCanvas(5, 1, CanvasSymbols.Ascii);

        canvas.PutText(0, 0, "a\u001b\u202Eb\u0085", new CellTag(CellLayer.Label));

        Assert.Equal("a??b?", canvas.Lines()[0]);
    }

    [Fact]
    public void Text_is_clipped_at_the_edges()
    {
        var canvas = new DotCanvas(4, 1, CanvasSymbols.Ascii);

        canvas.PutText(-1, 0, "abc", new CellTag(CellLayer.Label));
        canvas.PutText(3, 0, "xyz", new CellTag(CellLayer.Label));

        Assert.Equal("bc x", canvas.Lines()[0]);
    }

    [Fact]
    public void Runs_group_neighbouring_cells_with_equal_tags()
    {
        CellTag a = CellTag.Branch(1);
        CellTag b = new(CellLayer.Axis);

        IReadOnlyList<TagRun> runs = TagRun.Split([a, a, b, CellTag.None, CellTag.None]);

        Assert.Equal([new TagRun(0, 2, a), new TagRun(2, 1, b), new TagRun(3, 2, CellTag.None)], runs);
    }

    // Bresenham's line algorithm sets exactly one dot per step along the longer axis, both ends included, and each
    // dot touches the previous one (Bresenham, IBM Systems Journal 4(1), 1965; common practice).
    [Fact]
    public void Lines_have_one_dot_per_major_step_and_include_both_ends()
    {
        Gen.Select(Gen.Int[0, 39], Gen.Int[0, 23], Gen.Int[0, 39], Gen.Int[0, 23]).Sample((x0, y0, x1, y1) =>
        {
            var canvas = new DotCanvas(20, 6, CanvasSymbols.Braille);
            canvas.DrawLine(x0, y0, x1, y1, CellTag.Branch(0));

            int count = 0;
            for (int y = 0; y < canvas.DotHeight; y++)
            {
                for (int x = 0; x < canvas.DotWidth; x++)
                {
                    count += canvas.IsDotSet(x, y) ? 1 : 0;
                }
            }

            return canvas.IsDotSet(x0, y0) && canvas.IsDotSet(x1, y1)
                && count == Math.Max(Math.Abs(x1 - x0), Math.Abs(y1 - y0)) + 1;
        });
    }
}
