using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Tests.Algebra;

public class PolynomialRootsTests
{
    [Fact]
    public void Closed_loop_of_the_classic_type_one_third_order_loop_sits_on_the_axis_at_gain_six()
    {
        // Loop K/(s(s+1)(s+2)): characteristic s^3 + 3s^2 + 2s + K; at K = 6 it factors as (s + 3)(s^2 + 2), so the
        // poles are -3 and ±j√2 (Ogata, Modern Control Engineering, 5th ed., root-locus chapter, Example 6-1,
        // from memory; factorisation checked by hand).
        var roots = PolynomialRoots.Find(Polynomial.FromDescending(1, 3, 2, 6));
        RootTestMath.AssertWellFormed(roots);
        Assert.Equal(-3.0, roots[0].Real, 1e-14);
        Assert.Equal(0.0, roots[0].Imaginary);
        Assert.Equal(0.0, roots[1].Real, 1e-14);
        Assert.Equal(-Math.Sqrt(2.0), roots[1].Imaginary, 1e-14);
        Assert.Equal(Math.Sqrt(2.0), roots[2].Imaginary, 1e-14);
    }

    [Fact]
    public void Marginal_gain_of_a_third_order_loop_gives_poles_at_plus_minus_2j()
    {
        // s^3 + 2s^2 + 4s + 8 = (s + 2)(s^2 + 4): the marginal-stability gain of the loop K/(s(s^2 + 2s + 4))
        // (common practice; a routine Routh–Hurwitz exercise, factorisation checked by hand).
        var roots = PolynomialRoots.Find(Polynomial.FromDescending(1, 2, 4, 8));
        var expected = new[] { new Complex(-2, 0), new Complex(0, -2), new Complex(0, 2) };
        Assert.True(RootTestMath.MaxMatchedRelativeDistance(expected, roots) <= 1e-14);
        Assert.Equal(0.0, roots[0].Imaginary);
    }

    [Fact]
    public void A_real_root_comes_back_with_imaginary_part_exactly_zero()
    {
        // s^3 + 1 = (s + 1)(s^2 - s + 1): -1 and 1/2 ± j√3/2 (common practice: cube roots of -1).
        var roots = PolynomialRoots.Find(Polynomial.FromDescending(1, 0, 0, 1));
        RootTestMath.AssertWellFormed(roots);
        Assert.Equal(-1.0, roots[0].Real, 1e-15);
        Assert.Equal(0.0, roots[0].Imaginary);
        Assert.Equal(0.5, roots[1].Real, 1e-15);
        Assert.Equal(Math.Sqrt(3.0) / 2.0, roots[2].Imaginary, 1e-15);
        Assert.Equal(roots[1], Complex.Conjugate(roots[2]));
    }

    [Fact]
    public void The_quadratic_formula_does_not_lose_the_small_root_to_cancellation()
    {
        // s^2 + 1e8 s + 1: the naive formula returns the small root -1e-8 with no correct digit; the stable form
        // gives both to full precision (Forsythe, "How do you solve a quadratic equation?", 1966, from memory).
        // Exact roots: -5e7 ± sqrt(2.5e15 - 1); the small one is -1e-8·(1 + 1e-16 + ...).
        var roots = PolynomialRoots.Find(Polynomial.FromAscending(1, 1e8, 1));
        Assert.Equal(-1e8, roots[0].Real, 1e-7);
        Assert.Equal(-1e-8, roots[1].Real, 1e-22);
        Assert.All(roots, r => Assert.Equal(0.0, r.Imaginary));
    }

    [Fact]
    public void A_nearly_double_quadratic_root_keeps_the_accuracy_its_conditioning_allows()
    {
        // (s - 1)(s - (1 + 2^-26)) has roots 2^-26 apart; an exactly representable example (common practice).
        // The coefficients are exact, so a correctly rounded discriminant gives both roots to about 1e-16.
        double d = Math.ScaleB(1.0, -26);
        var roots = PolynomialRoots.Find(Polynomial.FromAscending(1.0 + d, -(2.0 + d), 1.0));
        Assert.Equal(1.0, roots[0].Real, 1e-15);
        Assert.Equal(1.0 + d, roots[1].Real, 1e-15);
    }

    [Fact]
    public void Roots_at_the_origin_are_split_off_exactly()
    {
        // s^2 (s + 1)(s^2 + 2s + 5): 0, 0, -1, -1 ± 2j (common practice).
        var p = Polynomial.FromDescending(1, 3, 7, 5, 0, 0);
        var roots = PolynomialRoots.Find(p);
        RootTestMath.AssertWellFormed(roots);
        Assert.Equal(2, roots.Count(r => r == Complex.Zero));
        var expected = new[] { Complex.Zero, Complex.Zero, new Complex(-1, 0), new Complex(-1, 2), new Complex(-1, -2) };
        Assert.True(RootTestMath.MaxMatchedRelativeDistance(expected, roots) <= 1e-14);
    }

    [Fact]
    public void An_eightfold_root_is_found_as_well_as_its_conditioning_allows()
    {
        // (s + 1)^8: a perturbation of relative size ε in the coefficients moves an 8-fold root by about
        // (256·ε)^(1/8) ≈ 0.02 (Wilkinson, Rounding Errors in Algebraic Processes, 1963, from memory), while the mean
        // of the cluster is pinned by the s^7 coefficient (the companion matrix's trace).
        var p = Polynomial.FromAscending(1, 1).Pow(8);
        var roots = PolynomialRoots.Find(p);
        RootTestMath.AssertWellFormed(roots);
        Assert.All(roots, r => Assert.True(Complex.Abs(r + 1.0) <= 0.05, $"{r}"));
        var mean = roots.Aggregate(Complex.Zero, (a, b) => a + b) / roots.Length;
        Assert.Equal(-1.0, mean.Real, 1e-12);
        Assert.All(roots, r => Assert.True(RootTestMath.BackwardError(p, r) <= 1e-14));
    }

    [Fact]
    public void A_tight_cluster_of_distinct_roots_stays_distinct()
    {
        // Roots -1, -1.001, -1.002, -1.003: separation 1e-3 makes them ill-conditioned (condition about 1e9·ε per
        // root, common practice), but polishing must not merge two of them.
        double[] expected = [-1.003, -1.002, -1.001, -1.0];
        var roots = PolynomialRoots.Find(Polynomial.FromRoots(expected.Select(x => new Complex(x, 0))));
        Assert.Equal(4, roots.Length);
        for (int i = 0; i < 4; i++)
        {
            Assert.Equal(expected[i], roots[i].Real, 1e-5);
            Assert.Equal(0.0, roots[i].Imaginary, 1e-5);
        }

        Assert.Equal(4, roots.Distinct().Count());
    }

    [Fact]
    public void Wilkinsons_polynomial_is_solved_with_tiny_backward_error_though_its_roots_move()
    {
        // Π(s - i), i = 1..20 (Wilkinson, 1959/1963, from memory): its coefficients are not representable in
        // doubles, so the stored polynomial's roots near 14..16 differ from the integers by up to about 0.03.
        // What the method owes is a tiny backward error; the small, well-conditioned roots stay accurate.
        var p = Polynomial.FromRoots(Enumerable.Range(1, 20).Select(i => new Complex(i, 0)));
        var roots = PolynomialRoots.Find(p);
        Assert.Equal(20, roots.Length);
        Assert.All(roots, r => Assert.True(RootTestMath.BackwardError(p, r) <= 1e-14, $"{r}"));
        Assert.Equal(1.0, roots[0].Real, 1e-10);
        Assert.Equal(2.0, roots[1].Real, 1e-9);
        Assert.Equal(20.0, roots.Max(r => r.Real), 1e-3);
        Assert.All(roots, r => Assert.True(Math.Abs(r.Real - Math.Round(r.Real)) < 0.1, $"{r}"));
    }

    [Fact]
    public void Degree_zero_has_no_roots_and_degree_one_is_exact()
    {
        Assert.Empty(PolynomialRoots.Find(Polynomial.Constant(3.0)));
        var one = PolynomialRoots.Find(Polynomial.FromAscending(3.0, 2.0));
        Assert.Equal(new Complex(-1.5, 0), Assert.Single(one));
    }

    [Fact]
    public void Bad_input_throws_from_Find_and_returns_false_from_TryFind()
    {
        Assert.Throws<ArgumentException>(() => PolynomialRoots.Find(Polynomial.Zero));
        Assert.Throws<ArgumentException>(() => PolynomialRoots.Find(Polynomial.FromAscending(1, double.NaN, 1)));
        Assert.False(PolynomialRoots.TryFind(Polynomial.Zero, out var none));
        Assert.Empty(none);
        Assert.False(PolynomialRoots.TryFind(Polynomial.FromAscending(1, double.PositiveInfinity), out _));
        Assert.Throws<ArgumentOutOfRangeException>(
            () => PolynomialRoots.Find(Polynomial.X, new RootFindingOptions { MaxPolishSteps = -1 }));
    }

    [Fact]
    public void The_span_form_matches_the_array_form_and_ignores_trailing_zeros()
    {
        double[] ascending = [6, 11, 6, 1, 0, 0];
        var destination = new Complex[8];
        Assert.True(PolynomialRoots.TryFind(ascending, destination, RootFindingOptions.Default, out int count));
        Assert.Equal(3, count);
        Assert.Equal(PolynomialRoots.Find(Polynomial.FromAscending(ascending)), destination[..3]);
        Assert.False(PolynomialRoots.TryFind(ascending, new Complex[2], RootFindingOptions.Default, out _));
    }

    [Fact]
    public void Backward_error_helper_agrees_with_the_independent_formula()
    {
        var p = Polynomial.FromDescending(2, -3, 0.5, 7, -1);
        foreach (var z in new[] { new Complex(0.3, 0.1), new Complex(-4, 2), new Complex(1e6, -3), Complex.Zero })
        {
            Assert.Equal(RootTestMath.BackwardError(p, z), PolynomialRoots.BackwardError(p, z), 1e-13);
        }

        Assert.Equal(0.0, PolynomialRoots.BackwardError(Polynomial.X, Complex.Zero));
    }
}
