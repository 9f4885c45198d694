using TermLocus.App.Plot;

namespace TermLocus.App.Tests.Plot;

// Tick steps of 1, 2 or 5 x 10^k are the usual "nice numbers" for graph labels (P. Heckbert, "Nice Numbers for
// Graph Labels", Graphics Gems, 1990; from memory). Expected values below are worked by hand.
public class NiceTicksTests
{
    private const double Tol = 1e-12;

    [Theory]
    [InlineData(10.0, 5, 2.0)]
    [InlineData(7.0, 10, 1.0)]
    [InlineData(0.3, 4, 0.1)]
    [InlineData(100.0, 3, 50.0)]
    [InlineData(9.0, 4, 5.0)]
    [InlineData(1.0, 1, 1.0)]
    [InlineData(15.0, 16, 1.0)]
    [InlineData(2.4e-3, 4, 1e-3)]
    [InlineData(3500.0, 4, 1000.0)]
    public void Step_is_the_smallest_nice_number_giving_at_most_max_ticks(double span, int maxTicks, double expected) =>
        Assert.Equal(expected, NiceTicks.Step(span, maxTicks), expected * Tol);

    [Fact]
    public void Step_is_always_one_two_or_five_times_a_power_of_ten()
    {
        for (double span = 0.013; span < 1e5; span *= 1.37)
        {
            double step = NiceTicks.Step(span, 7);
            double mantissa = step / Math.Pow(10, Math.Floor(Math.Log10(step) + 1e-9));
            Assert.Contains([1.0, 2.0, 5.0], m => Math.Abs(m - mantissa) < 1e-9);
            Assert.True(span / step <= 7 + 1e-9, $"span {span} step {step}");
        }
    }

    [Theory]
    [InlineData(11.2, 12.0)]
    [InlineData(13.0, 15.0)]
    [InlineData(0.7, 0.8)]
    [InlineData(20.0, 20.0)]
    [InlineData(8.5, 10.0)]
    public void Round_span_up_uses_a_finer_ladder(double value, double expected) =>
        Assert.Equal(expected, NiceTicks.RoundSpanUp(value), expected * Tol);

    [Fact]
    public void Multiples_cover_the_range_and_zero_is_exact()
    {
        IReadOnlyList<double> ticks = NiceTicks.Multiples(-4.5, 4.5, 2);

        Assert.Equal([-4.0, -2.0, 0.0, 2.0, 4.0], ticks);
    }

    [Fact]
    public void Multiples_include_ends_that_are_multiples_despite_rounding()
    {
        IReadOnlyList<double> ticks = NiceTicks.Multiples(0.1, 0.3, 0.1);

        Assert.Equal(3, ticks.Count);
        Assert.Equal(0.1, ticks[0], Tol);
        Assert.Equal(0.3, ticks[2], Tol);
    }

    [Fact]
    public void Bad_spans_are_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => NiceTicks.Step(0, 5));
        Assert.Throws<ArgumentOutOfRangeException>(() => NiceTicks.Step(double.NaN, 5));
        Assert.Throws<ArgumentOutOfRangeException>(() => NiceTicks.Step(1, 0));
    }
}
