using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Tests.Algebra;

public class RootUncertaintyTests
{
    // Perturbation theory of polynomial roots (e.g. Wilkinson, Rounding Errors in Algebraic Processes, 1963, ch. 2,
    // from memory): a simple root moves by about ε·cond, a root of multiplicity k by about ε^(1/k).

    [Fact]
    public void Well_separated_roots_are_trusted()
    {
        var p = Polynomial.FromRoots([new Complex(-1, 0), new Complex(-2, 3), new Complex(-2, -3), new Complex(-10, 0)]);
        double spread = RootUncertainty.RelativeSpread(p, PolynomialRoots.Find(p));
        Assert.True(spread < 1e-12, $"spread {spread:E2}");
    }

    [Fact]
    public void A_double_root_moves_by_about_the_square_root_of_the_perturbation()
    {
        var p = Polynomial.FromRoots([new Complex(-1, 0), new Complex(-1, 0), new Complex(-5, 0)]);
        double spread = RootUncertainty.RelativeSpread(p, PolynomialRoots.Find(p));
        Assert.InRange(spread, 1e-9, 1e-5); // sqrt(1e-14) = 1e-7, times a modest factor
        Assert.True(spread < RootUncertainty.WorthWarning);
    }

    [Fact]
    public void A_high_order_repeated_root_is_flagged()
    {
        // (s+1)^40: the roots computed in double precision scatter on a circle of radius about (1e-16)^(1/40) ≈ 0.4.
        var p = Polynomial.FromRoots(Enumerable.Repeat(new Complex(-1, 0), 40));
        double spread = RootUncertainty.RelativeSpread(p, PolynomialRoots.Find(p));
        Assert.True(spread > RootUncertainty.WorthWarning, $"spread {spread:E2}");
    }

    [Fact]
    public void Wilkinsons_polynomial_is_flagged()
    {
        // Π(s - i), i = 1..20 (Wilkinson 1963, from memory): a relative change of 2^-23 in one coefficient turns
        // ten of its roots complex; a perturbation of 1e-14 moves roots near 15 in the third digit.
        var p = Polynomial.FromRoots(Enumerable.Range(1, 20).Select(i => new Complex(i, 0)));
        double spread = RootUncertainty.RelativeSpread(p, PolynomialRoots.Find(p));
        Assert.True(spread > RootUncertainty.WorthWarning, $"spread {spread:E2}");
    }

    [Fact]
    public void Wrong_root_count_is_an_argument_error()
    {
        var p = Polynomial.FromRoots([new Complex(-1, 0), new Complex(-2, 0)]);
        Assert.Throws<ArgumentException>(() => RootUncertainty.RelativeSpread(p, [new Complex(-1, 0)]));
    }
}
