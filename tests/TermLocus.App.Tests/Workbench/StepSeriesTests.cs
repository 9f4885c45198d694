using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class StepSeriesTests
{
    // The 1-2-5 series is the preferred-number series of instrument ranges (common practice).
    [Theory]
    [InlineData(20.0, 0.2)]
    [InlineData(7.0, 0.05)]
    [InlineData(0.003, 0.00002)]
    [InlineData(1000.0, 10.0)]
    public void Initial_step_is_a_1_2_5_value_near_a_hundredth_of_the_range(double width, double expected) =>
        Assert.Equal(expected, StepSeries.Initial(width), expected * 1e-12);

    [Fact]
    public void Finer_and_coarser_are_inverse_along_the_series()
    {
        double step = 1;
        foreach (double expected in new[] { 2.0, 5, 10, 20, 50 })
        {
            step = StepSeries.Coarser(step, 1000);
            Assert.Equal(expected, step, 1e-12);
        }

        foreach (double expected in new[] { 20.0, 10, 5, 2, 1, 0.5, 0.2, 0.1 })
        {
            step = StepSeries.Finer(step, 1000);
            Assert.Equal(expected, step, 1e-12);
        }
    }

    [Theory]
    [InlineData(0.8, 0.2, 1, 1.0)]
    [InlineData(0.8, 0.2, -1, 0.6)]
    [InlineData(0.83, 0.1, 1, 0.9)]
    [InlineData(0.83, 0.1, -1, 0.8)]
    [InlineData(-0.3, 0.1, 1, -0.2)]
    [InlineData(0.1 + 0.2, 0.1, 1, 0.4)]
    public void Next_snaps_to_the_grid_of_the_step(double value, double step, int direction, double expected) =>
        Assert.Equal(expected, StepSeries.Next(value, step, direction));
}
