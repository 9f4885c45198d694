using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Tests.Algebra;

public class PolynomialTests
{
    [Fact]
    public void Product_of_linear_factors_expands_like_the_hand_calculation()
    {
        // (s+1)(s+2) = s^2 + 3s + 2 (common practice: expanding a product by hand).
        var p = Polynomial.FromAscending(1, 1) * Polynomial.FromAscending(2, 1);
        Assert.Equal(new[] { 2.0, 3.0, 1.0 }, p.Coefficients.ToArray());
    }

    [Fact]
    public void Roots_of_a_known_cubic_are_found()
    {
        // (s+1)(s+2)(s+3) = s^3 + 6s^2 + 11s + 6 (common practice).
        var roots = PolynomialRoots.Find(Polynomial.FromDescending(1, 6, 11, 6));
        Assert.Equal(3, roots.Length);
        Assert.Equal(-3.0, roots[0].Real, 1e-12);
        Assert.Equal(-2.0, roots[1].Real, 1e-12);
        Assert.Equal(-1.0, roots[2].Real, 1e-12);
        Assert.All(roots, r => Assert.Equal(0.0, r.Imaginary, 1e-12));
    }

    [Fact]
    public void Evaluation_at_a_complex_point_matches_the_factored_form()
    {
        var p = Polynomial.FromRoots([new Complex(-1, 2), new Complex(-1, -2)]);
        var z = new Complex(0.5, 0.25);
        var expected = (z - new Complex(-1, 2)) * (z - new Complex(-1, -2));
        Assert.Equal(expected.Real, p.Evaluate(z).Real, 1e-12);
        Assert.Equal(expected.Imaginary, p.Evaluate(z).Imaginary, 1e-12);
    }
}
