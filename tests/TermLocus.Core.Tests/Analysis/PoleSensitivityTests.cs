using System.Numerics;
using CsCheck;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Analysis;

public class PoleSensitivityTests
{
    [Fact]
    public void Gain_sensitivity_of_a_second_order_loop_matches_the_derivative_of_the_closed_form()
    {
        // P = s^2 + 2s + K: for K > 1 the poles are -1 ± j√(K - 1), so d/dK of the upper pole is j/(2√(K - 1)),
        // j/4 at K = 5 (differentiating the closed form; common practice).
        var family = CharacteristicFamily.FromAffine(new AffineSplit(Polynomial.FromAscending(0, 2, 1), Polynomial.One));
        Assert.True(PoleSensitivity.TryCompute(family, 5.0, new Complex(-1, 2), out var ds));
        Assert.Equal(0.0, ds.Real, 1e-15);
        Assert.Equal(0.25, ds.Imaginary, 1e-15);
    }

    [Fact]
    public void At_the_breakaway_double_root_the_sensitivity_is_undefined()
    {
        // At K = 1, s^2 + 2s + 1 = (s + 1)^2: the poles move as ±j√(K - 1), with no finite derivative.
        var p = Polynomial.FromAscending(1, 2, 1);
        Assert.False(PoleSensitivity.TryCompute(p, Polynomial.One, new Complex(-1, 0), out _));
        Assert.False(PoleSensitivity.TryCompute(p, Polynomial.One, new Complex(-1, 1e-10), out _));
        Assert.Throws<InvalidOperationException>(() => PoleSensitivity.Compute(p, Polynomial.One, new Complex(-1, 0)));
    }

    [Fact]
    public void Agrees_with_finite_differences_of_the_roots_of_random_affine_families()
    {
        // External check: the roots themselves, found at p ± h, differenced centrally (common practice).
        // A fixed seed: the same 200 random families every run, so a rare near-multiple root cannot make CI flaky.
        var random = new Random(20261201);
        double Next(double lo, double hi) => lo + ((hi - lo) * random.NextDouble());
        for (int iteration = 0; iteration < 200; iteration++)
        {
            double[] a = [Next(-1, 1), Next(-1, 1), Next(-1, 1), Next(-1, 1)];
            double[] b = [Next(-1, 1), Next(-1, 1), Next(-1, 1), Next(-1, 1)];
            double p0 = Next(-2, 2);
            var split = new AffineSplit(Polynomial.FromAscending([.. a, 1.0]), Polynomial.FromAscending(b));
            var family = CharacteristicFamily.FromAffine(split);
            var roots = PolynomialRoots.Find(family.At(p0));
            if (MinimumGap(roots) < 1e-2)
            {
                continue; // near a multiple root the finite difference itself is unreliable
            }

            double gap = MinimumGap(roots);
            foreach (var s0 in roots)
            {
                // The step keeps the pole's move to a thousandth of the root spacing; central differences at h and
                // h/2 then disagree by about the truncation error (Richardson's idea, common practice), so curvature of
                // a fast-moving pole is not blamed on the formula.
                Assert.True(PoleSensitivity.TryCompute(family, p0, s0, out var ds));
                double h = 1e-3 * gap / Math.Max(1.0, Complex.Abs(ds));
                var coarse = CentralDifference(family, p0, s0, h);
                var fine = CentralDifference(family, p0, s0, h / 2);
                double allowance = (1e-6 * Math.Max(1.0, Complex.Abs(fine))) + (2 * Complex.Abs(coarse - fine));
                Assert.True(Complex.Abs(ds - fine) <= allowance, $"{s0}: {ds} vs {fine} (coarse {coarse})");
            }
        }
    }

    [Fact]
    public void A_non_affine_family_uses_a_central_difference_in_the_parameter()
    {
        // P(s; p) = s^2 + p^2·s + 1, ∂P/∂p = 2p·s, so ds/dp = -2p·s0 / (2s0 + p^2) (implicit differentiation by hand).
        var family = CharacteristicFamily.FromFunction(p => Polynomial.FromAscending(1, p * p, 1));
        const double p0 = 0.8;
        foreach (var s0 in PolynomialRoots.Find(family.At(p0)))
        {
            var expected = -2 * p0 * s0 / ((2 * s0) + (p0 * p0));
            Assert.True(PoleSensitivity.TryCompute(family, p0, s0, out var ds));
            Assert.True(Complex.Abs(ds - expected) <= 1e-9 * Complex.Abs(expected), $"{ds} vs {expected}");
        }

        var derivative = PoleSensitivity.ParameterDerivative(family, p0);
        Assert.Equal(2 * p0, derivative[1], 1e-9);
        Assert.Equal(0.0, derivative[0], 1e-9);
    }

    private static Complex CentralDifference(CharacteristicFamily family, double p0, Complex s0, double h)
    {
        var up = Nearest(PolynomialRoots.Find(family.At(p0 + h)), s0);
        var down = Nearest(PolynomialRoots.Find(family.At(p0 - h)), s0);
        return (up - down) / (2 * h);
    }

    private static Complex Nearest(Complex[] roots, Complex target) => roots.MinBy(r => Complex.Abs(r - target));

    private static double MinimumGap(Complex[] roots)
    {
        double gap = double.PositiveInfinity;
        for (int i = 0; i < roots.Length; i++)
        {
            for (int j = i + 1; j < roots.Length; j++)
            {
                gap = Math.Min(gap, Complex.Abs(roots[i] - roots[j]));
            }
        }

        return gap;
    }
}
