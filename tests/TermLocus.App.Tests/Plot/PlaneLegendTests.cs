using TermLocus.App.Canvas;
using TermLocus.App.Plot;

namespace TermLocus.App.Tests.Plot;

public class PlaneLegendTests
{
    [Fact]
    public void The_braille_legend_names_every_mark()
    {
        Assert.Equal(
            "× open-loop pole  ○ zero  ● closed-loop pole  ▲ off spec  ⋯ spec limit",
            PlaneLegend.Line(CanvasSymbols.Braille));
    }

    [Fact]
    public void The_ascii_legend_is_pure_ascii()
    {
        string legend = PlaneLegend.Line(CanvasSymbols.Ascii);

        Assert.Equal("x open-loop pole  o zero  # closed-loop pole  ! off spec  .. spec limit", legend);
        Assert.True(legend.All(char.IsAscii));
    }

    [Fact]
    public void Items_that_do_not_fit_are_dropped_whole()
    {
        Assert.Equal("× open-loop pole  ○ zero", PlaneLegend.Line(CanvasSymbols.Braille, 40));
        Assert.Equal(string.Empty, PlaneLegend.Line(CanvasSymbols.Braille, 5));
    }
}
