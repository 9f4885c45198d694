using TermLocus.App.Canvas;

namespace TermLocus.App.Tests.Canvas;

public class DotCanvasAsciiTests
{
    private static readonly CellTag Branch0 = CellTag.Branch(0);

    [Theory]
    [InlineData(0, 0, "'")]
    [InlineData(1, 0, "'")]
    [InlineData(0, 1, ".")]
    [InlineData(1, 1, ".")]
    public void A_single_dot_shows_its_height(int x, int y, string expected)
    {
        var canvas = new DotCanvas(1, 1, CanvasSymbols.Ascii);

        canvas.SetDot(x, y, Branch0);

        Assert.Equal(expected, canvas.Lines()[0]);
    }

    [Theory]
    [InlineData(0, 0, 5, 0, "---")]
    [InlineData(0, 1, 5, 1, "___")]
    public void Horizontal_lines_are_dashes_or_underscores(int x0, int y0, int x1, int y1, string expected)
    {
        var canvas = new DotCanvas(3, 1, CanvasSymbols.Ascii);

        canvas.DrawLine(x0, y0, x1, y1, Branch0);

        Assert.Equal(expected, canvas.Lines()[0]);
    }

    [Fact]
    public void Vertical_and_diagonal_lines_use_bars_and_slashes()
    {
        var vertical = new DotCanvas(1, 2, CanvasSymbols.Ascii);
        var falling = new DotCanvas(2, 2, CanvasSymbols.Ascii);
        var rising = new DotCanvas(2, 2, CanvasSymbols.Ascii);

        vertical.DrawLine(1, 0, 1, 3, Branch0);
        falling.DrawLine(0, 0, 3, 3, Branch0);
        rising.DrawLine(0, 3, 3, 0, Branch0);

        Assert.Equal(["|", "|"], vertical.Lines());
        Assert.Equal(["\\ ", " \\"], falling.Lines());
        Assert.Equal([" /", "/ "], rising.Lines());
    }

    [Fact]
    public void Crossing_lines_show_a_plus()
    {
        var canvas = new DotCanvas(3, 2, CanvasSymbols.Ascii);

        canvas.DrawLine(0, 2, 5, 2, Branch0);
        canvas.DrawLine(2, 0, 2, 3, Branch0);

        Assert.Equal([" | ", "-+-"], canvas.Lines());
    }

    [Fact]
    public void Ascii_output_contains_only_ascii()
    {
        var canvas = new DotCanvas(6, 3, CanvasSymbols.Ascii);
        canvas.DrawLine(0, 0, 11, 5, Branch0);
        canvas.DrawLine(11, 0, 0, 5, Branch0);
        canvas.DrawLine(0, 3, 11, 2, Branch0);

        Assert.All(canvas.Lines(), line => Assert.True(line.All(char.IsAscii), line));
    }
}
