using TermLocus.App.Plot;

namespace TermLocus.App.Tests.Plot;

// Compact labels as requested for the plot (common practice: shortest text that shows the step's digits).
public class TickLabelTests
{
    [Theory]
    [InlineData(2.0, 1.0, "2")]
    [InlineData(0.5, 0.5, "0.5")]
    [InlineData(1.0, 0.5, "1")]
    [InlineData(-10.0, 5.0, "-10")]
    [InlineData(0.30000000000000004, 0.1, "0.3")]
    [InlineData(-0.0, 1.0, "0")]
    [InlineData(1e-17, 0.1, "0")]
    [InlineData(100.0, 50.0, "100")]
    [InlineData(1000.0, 500.0, "1e3")]
    [InlineData(1500.0, 500.0, "1.5e3")]
    [InlineData(-20000.0, 10000.0, "-2e4")]
    [InlineData(2.5e-4, 5e-5, "2.5e-4")]
    [InlineData(0.05, 0.05, "0.05")]
    [InlineData(0.25, 0.05, "0.25")]
    public void Labels_are_short_and_invariant(double value, double step, string expected) =>
        Assert.Equal(expected, TickLabel.Format(value, step));
}
