using TermLocus.Core.Algebra;
using TermLocus.Core.Time;

namespace TermLocus.Core.Tests.Time;

public class ResponseGridTests
{
    // These check the documented rules of ResponseGrid against poles worked out by hand.
    [Fact]
    public void Stable_loop_lasts_eight_slowest_time_constants()
    {
        var grid = ResponseGrid.For(StepResponseTests.SecondOrder(0.5, 1.0));
        Assert.Equal(16.0, grid.DurationSeconds, 1e-9); // σ = ζωn = 0.5
        Assert.Equal(ResponseGrid.MinimumAutomaticSamples, grid.Samples);
        Assert.Equal(8.0 * 0.3, ResponseGrid.For(StepResponseTests.Lag(0.3)).DurationSeconds, 1e-9);
    }

    [Fact]
    public void Lightly_damped_fast_oscillation_gets_thirty_samples_a_cycle()
    {
        // ωn = 100, ζ = 0.01: σ = 1 → 8 s; 8·100·30/(2π) + 1 samples.
        var grid = ResponseGrid.For(StepResponseTests.SecondOrder(0.01, 100.0));
        Assert.Equal(8.0, grid.DurationSeconds, 1e-6);
        Assert.Equal((int)Math.Ceiling(8.0 * 100.0 * 30.0 / (2 * Math.PI)) + 1, grid.Samples);
    }

    [Fact]
    public void Growing_loop_lasts_until_it_has_grown_four_hundredfold()
    {
        var grid = ResponseGrid.For(new RationalFunction(Polynomial.One, Polynomial.FromAscending(-2, 1)));
        Assert.Equal(3.0, grid.DurationSeconds, 1e-12);
    }

    [Fact]
    public void Pole_hidden_by_an_equal_zero_does_not_stretch_the_grid()
    {
        // (s + 0.001)/((s + 0.001)(s + 1)): the slow pole has no residue, so 8 s, not 8000 s.
        var hidden = new RationalFunction(
            Polynomial.FromAscending(0.001, 1), Polynomial.FromAscending(0.001, 1) * Polynomial.FromAscending(1, 1));
        Assert.Equal(8.0, ResponseGrid.For(hidden).DurationSeconds, 1e-6);
    }

    [Fact]
    public void Repeated_fast_pole_does_not_hide_a_slow_one()
    {
        // 10/((s + 10)²(s + 1)) · 10: the slow pole at −1 still sets 8 s.
        var h = new RationalFunction(
            Polynomial.Constant(100), Polynomial.FromAscending(10, 1).Pow(2) * Polynomial.FromAscending(1, 1));
        Assert.Equal(8.0, ResponseGrid.For(h).DurationSeconds, 1e-6);
    }

    [Fact]
    public void Delay_is_added_and_integrators_fall_back_to_ten_seconds()
    {
        Assert.Equal(8.0 + 0.5, ResponseGrid.For(StepResponseTests.Lag(1.0), 0.5).DurationSeconds, 1e-9);
        Assert.Equal(10.0, ResponseGrid.For(new RationalFunction(Polynomial.One, Polynomial.X)).DurationSeconds, 0.0);
        Assert.Equal(10.0, ResponseGrid.For(RationalFunction.Constant(2.0)).DurationSeconds, 0.0);
    }
}
