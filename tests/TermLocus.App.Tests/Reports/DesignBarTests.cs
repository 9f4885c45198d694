using TermLocus.App.Reports;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Reports;

public class DesignBarTests
{
    private static FeasibleInterval Between(double from, double to) => new(from, to, []);

    [Fact]
    public void Cells_mostly_inside_an_interval_are_filled_and_the_recommended_cell_is_marked()
    {
        // Span 0..10 in 10 cells of width 1: [2, 6.4] covers cells 2..5 fully and cell 6 to 40 % (not half).
        string bar = DesignBar.Line(new Interval(0, 10), [Between(2, 6.4)], 4.5, 10);
        Assert.Equal("[--==|=----]", bar);
    }

    [Fact]
    public void An_interval_narrower_than_a_cell_still_shows_and_gaps_between_intervals_stay_visible()
    {
        string bar = DesignBar.Line(new Interval(0, 100), [Between(0, 30), Between(50.2, 50.3), Between(80, 100)], null, 10);
        Assert.Equal("[===--=--==]", bar);
    }

    [Fact]
    public void No_interval_is_all_dashes_and_bad_arguments_are_refused()
    {
        Assert.Equal("[-----]", DesignBar.Line(new Interval(-1, 1), [], null, 5));
        Assert.Throws<ArgumentOutOfRangeException>(() => DesignBar.Line(new Interval(0, 1), [], null, 0));
        Assert.Throws<ArgumentException>(() => DesignBar.Line(new Interval(1, 1), [], null, 5));
    }
}
