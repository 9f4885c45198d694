using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Analysis;

public class SignIntervalsTests
{
    [Fact]
    public void Intervals_of_a_cubic_with_known_roots_are_solved_to_the_tolerance()
    {
        // (x-1)(x-3)(x-6) >= 0 on [1,3] and [6,8] inside [0,8] (common practice: sign chart of a factored cubic).
        var found = SignIntervals.Find(x => (x - 1) * (x - 3) * (x - 6), 0, 8, gridPoints: 50);
        Assert.Equal(2, found.Count);
        Assert.Equal(1.0, found[0].From, 1e-10);
        Assert.Equal(3.0, found[0].To, 1e-10);
        Assert.Equal(6.0, found[1].From, 1e-10);
        Assert.Equal(8.0, found[1].To);
    }

    [Fact]
    public void A_narrow_interval_between_grid_points_is_found_from_an_extra_point()
    {
        // -(x-2.001)(x-2.002) >= 0 only on [2.001, 2.002]; a 5-point grid steps over it.
        Func<double, double> f = x => -(x - 2.001) * (x - 2.002);
        Assert.Empty(SignIntervals.Find(f, 0, 4, gridPoints: 5));
        var found = SignIntervals.Find(f, 0, 4, gridPoints: 5, extraPoints: [2.0015]);
        Assert.Single(found);
        Assert.Equal(2.001, found[0].From, 1e-10);
        Assert.Equal(2.002, found[0].To, 1e-10);
    }

    [Fact]
    public void Nan_counts_as_infeasible()
    {
        var found = SignIntervals.Find(x => x < 1 ? double.NaN : 1.0, 0, 2, gridPoints: 9);
        Assert.Single(found);
        Assert.Equal(1.0, found[0].From, 1e-10);
    }
}
