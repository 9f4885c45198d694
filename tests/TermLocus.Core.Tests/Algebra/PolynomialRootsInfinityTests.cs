using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Tests.Algebra;

public class PolynomialRootsInfinityTests
{
    /// <summary>
    /// A(s) + p·B(s) at the value of p where the s^3 terms cancel: 0.3 - 3·0.1 leaves about -5.6e-17 of rounding
    /// noise (common practice: 0.1 is not a binary fraction), the rest is s^2 + 3s + 2 = (s + 1)(s + 2).
    /// With <paramref name="unit"/> u the polynomial is taken in u·s, so the roots are -1/u and -2/u.
    /// </summary>
    private static Polynomial CancelledCubic(double unit = 1.0)
    {
        var a = Polynomial.FromAscending(2, 3 * unit, 1 * unit * unit, 0.3 * unit * unit * unit);
        var b = Polynomial.FromAscending(0, 0, 0, -0.1 * unit * unit * unit);
        return a + b.Scale(3.0);
    }

    [Fact]
    public void A_leading_coefficient_left_by_cancellation_is_a_root_at_infinity()
    {
        var p = CancelledCubic();
        Assert.Equal(3, p.Degree);
        Assert.True(Math.Abs(p.Leading) < 1e-15);

        // Without the detection the noise produces a huge, meaningless root.
        Assert.True(PolynomialRoots.Find(p).Max(Complex.Abs) > 1e15);

        var set = PolynomialRoots.FindWithInfinite(p);
        Assert.Equal(1, set.InfiniteCount);
        Assert.Equal(2, set.Finite.Length);
        Assert.Equal(-2.0, set.Finite[0].Real, 1e-14);
        Assert.Equal(-1.0, set.Finite[1].Real, 1e-14);
        Assert.All(set.Finite, r => Assert.Equal(0.0, r.Imaginary));
    }

    [Fact]
    public void The_decision_does_not_depend_on_the_unit_of_s()
    {
        // The same polynomial with s measured in units of 2^20 (a power of two, so the rounding noise is carried over
        // exactly): roots -2^-20 and -2^-19. Its noise term is 64 against a largest coefficient of 1.1e12, which a
        // plain "relative to the largest coefficient" test at 1e-12 would keep; the scale-free test still drops it.
        double unit = Math.ScaleB(1.0, 20);
        var p = CancelledCubic(unit);
        Assert.True(Math.Abs(p.Leading) / p.MaxAbsCoefficient() > 1e-12);
        var set = PolynomialRoots.FindWithInfinite(p);
        Assert.Equal(1, set.InfiniteCount);
        Assert.Equal(-2.0 / unit, set.Finite[0].Real, 1e-14 / unit);
        Assert.Equal(-1.0 / unit, set.Finite[1].Real, 1e-14 / unit);
    }

    [Fact]
    public void A_genuinely_small_leading_coefficient_keeps_its_large_root()
    {
        // ε s^2 + s + 1, ε = 1e-9: roots -1 - ε - 2ε² - ... and -1/ε minus that (sum of roots = -1/ε; series
        // expansion, common practice).
        const double eps = 1e-9;
        var set = PolynomialRoots.FindWithInfinite(Polynomial.FromAscending(1, 1, eps));
        Assert.Equal(0, set.InfiniteCount);
        double small = -1 - eps - (2 * eps * eps);
        Assert.Equal(-1 / eps - small, set.Finite[0].Real, 1e-15 / eps);
        Assert.Equal(small, set.Finite[1].Real, 1e-15);
    }

    [Fact]
    public void Two_vanished_leading_coefficients_give_two_roots_at_infinity()
    {
        var set = PolynomialRoots.FindWithInfinite(Polynomial.FromAscending(2, 3, 1, 1e-17, 1e-18));
        Assert.Equal(2, set.InfiniteCount);
        Assert.Equal(-2.0, set.Finite[0].Real, 1e-14);
        Assert.Equal(-1.0, set.Finite[1].Real, 1e-14);
    }

    [Fact]
    public void With_nothing_left_to_compare_with_the_reference_radius_is_one()
    {
        // 1e-20·s + 1: the only root is beyond 1e12 rad/s, so it counts as infinite; 1e-6·s + 1 keeps its root -1e6.
        var gone = PolynomialRoots.FindWithInfinite(Polynomial.FromAscending(1, 1e-20));
        Assert.Equal(1, gone.InfiniteCount);
        Assert.Empty(gone.Finite);
        var kept = PolynomialRoots.FindWithInfinite(Polynomial.FromAscending(1, 1e-6));
        Assert.Equal(0, kept.InfiniteCount);
        Assert.Equal(-1e6, Assert.Single(kept.Finite).Real, 1e-9);
    }

    [Fact]
    public void Roots_at_the_origin_and_at_infinity_together()
    {
        var p = CancelledCubic() * Polynomial.X;
        var set = PolynomialRoots.FindWithInfinite(p);
        Assert.Equal(1, set.InfiniteCount);
        Assert.Equal(3, set.Finite.Length);
        Assert.Equal(Complex.Zero, set.Finite[2]);
    }

    [Fact]
    public void A_zero_tolerance_turns_the_detection_off()
    {
        var options = new RootFindingOptions { InfiniteRootRelativeTolerance = 0.0 };
        var set = PolynomialRoots.FindWithInfinite(CancelledCubic(), options);
        Assert.Equal(0, set.InfiniteCount);
        Assert.Equal(3, set.Finite.Length);
    }

    [Fact]
    public void Bad_input_is_reported()
    {
        Assert.Throws<ArgumentException>(() => PolynomialRoots.FindWithInfinite(Polynomial.Zero));
        Assert.False(PolynomialRoots.TryFindWithInfinite(Polynomial.Zero, RootFindingOptions.Default, out var none));
        Assert.Null(none);
    }
}
