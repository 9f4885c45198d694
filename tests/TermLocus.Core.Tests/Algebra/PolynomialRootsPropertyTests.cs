using System.Numerics;
using CsCheck;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Tests.Algebra;

public class PolynomialRootsPropertyTests
{
    /// <summary>The accuracy promised for well-conditioned polynomials up to degree 40: backward error below 1e-12.</summary>
    private const double BackwardErrorBound = 1e-12;

    private static readonly Gen<double[]> UnitCoefficients =
        Gen.Int[3, 40].SelectMany(n => Gen.Double[-1.0, 1.0].Array[n + 1]).Where(c => Math.Abs(c[^1]) > 1e-3);

    /// <summary>Coefficients whose magnitudes are spread uniformly in log scale over 1e-9..1e9, random signs.</summary>
    private static readonly Gen<double[]> WideCoefficients =
        Gen.Int[3, 40].SelectMany(n => Gen.Select(Gen.Double[-9.0, 9.0], Gen.Bool, (e, neg) => (neg ? -1.0 : 1.0) * Math.Pow(10.0, e)).Array[n + 1]);

    /// <summary>1..4 real roots or conjugate pairs with magnitudes 10^-3..10^3 and angles in the left or right half-plane.</summary>
    private static readonly Gen<Complex[]> SpreadRoots =
        Gen.Select(Gen.Double[-3.0, 3.0], Gen.Double[0.05, 0.95], Gen.Bool, (e, angle, pair) => (e, angle, pair))
            .Array[1, 4]
            .Select(factors => factors.SelectMany(f =>
            {
                double r = Math.Pow(10.0, f.e);
                var z = Complex.FromPolarCoordinates(r, Math.PI * f.angle);
                return f.pair ? new[] { z, Complex.Conjugate(z) } : new[] { new Complex(f.angle < 0.5 ? r : -r, 0) };
            }).ToArray());

    [Fact]
    public void Random_polynomials_up_to_degree_40_have_tiny_backward_error()
    {
        // Bound: a backward-stable method leaves a backward error of a modest multiple of ε = 2.2e-16
        // (Edelman and Murakami, "Polynomial roots from companion matrix eigenvalues", 1995, from memory).
        UnitCoefficients.Sample(c =>
        {
            var p = Polynomial.FromAscending(c);
            var roots = PolynomialRoots.Find(p);
            Assert.Equal(p.Degree, roots.Length);
            RootTestMath.AssertWellFormed(roots);
            Assert.All(roots, r => Assert.True(RootTestMath.BackwardError(p, r) <= BackwardErrorBound, $"{r}"));
        }, iter: 300);
    }

    [Fact]
    public void Coefficients_spanning_1e_minus_9_to_1e9_are_handled()
    {
        WideCoefficients.Sample(c =>
        {
            var p = Polynomial.FromAscending(c);
            var roots = PolynomialRoots.Find(p);
            RootTestMath.AssertWellFormed(roots);
            Assert.All(roots, r => Assert.True(RootTestMath.BackwardError(p, r) <= BackwardErrorBound, $"{r}"));
        }, iter: 300);
    }

    [Fact]
    public void Roots_spread_over_six_decades_come_back_to_relative_accuracy()
    {
        // Roots separated in magnitude are well conditioned relative to their own size (common practice), so each
        // is recovered to a relative 1e-9 even when the coefficients span many decades.
        SpreadRoots.Sample(expected =>
        {
            var p = Polynomial.FromRoots(expected);
            var roots = PolynomialRoots.Find(p);
            for (int i = 0; i < expected.Length; i++)
            {
                var e = expected[i];
                double nearest = roots.Min(r => Complex.Abs(r - e));
                Assert.True(nearest <= 1e-9 * Complex.Abs(e) || Separation(expected, i) < 1e-2 * Complex.Abs(e), $"{e}: {nearest}");
            }
        }, iter: 300);
    }

    [Fact]
    public void A_plant_with_time_constants_from_a_millisecond_to_a_thousand_seconds_is_solved_to_full_accuracy()
    {
        // 1e-9·(s + 1e-3)(s + 1)(s + 1e3)(s^2 + 30s + 2500): coefficients from about 1e-12 to about 1e-3
        // (an invented plant; factorisation is the reference).
        Complex[] expected = [-1e-3, -1.0, -1e3, new Complex(-15, -Math.Sqrt(2500 - 225)), new Complex(-15, Math.Sqrt(2500 - 225))];
        var p = Polynomial.FromRoots(expected).Scale(1e-9);
        var roots = PolynomialRoots.Find(p);
        foreach (var e in expected)
        {
            Assert.True(roots.Min(r => Complex.Abs(r - e)) <= 1e-12 * Complex.Abs(e), $"{e}");
        }
    }

    [Fact]
    public void Roots_are_as_accurate_as_MathNets_plain_companion_eigenvalues()
    {
        // External reference: MathNet's general eigenvalue solver on the unbalanced, unscaled companion matrix.
        // Roots are kept at least 0.1 apart and within |s| <= 3; up to degree 16 such clusters are ill-conditioned
        // enough (rounding the coefficients moves a root by up to about 3e-7 relative, seed cmg50bXRXI21) that the two
        // solvers can differ by more than either is wrong. So both are measured against the true roots: ours must
        // be within 1e-8 of them or no further than twice the reference's own error.
        SpreadRootsInBox().Sample(expected =>
        {
            var p = Polynomial.FromRoots(expected);
            var reference = RootTestMath.MathNetCompanionEigenvalues(p);
            var roots = PolynomialRoots.Find(p);
            double ours = RootTestMath.MaxMatchedRelativeDistance(expected, roots);
            double theirs = RootTestMath.MaxMatchedRelativeDistance(expected, reference);
            Assert.True(ours <= Math.Max(1e-8, 2 * theirs), $"ours {ours:E2}, reference {theirs:E2} from the true roots");
        }, iter: int.Parse(Environment.GetEnvironmentVariable("ROOTS_ITER") ?? "200", System.Globalization.CultureInfo.InvariantCulture));
    }

    [Fact]
    public void Roots_of_a_product_are_the_union_of_the_roots_of_the_factors()
    {
        var factor = Gen.Int[1, 6].SelectMany(n => Gen.Double[-1.0, 1.0].Array[n + 1]).Where(c => Math.Abs(c[^1]) > 0.1);
        Gen.Select(factor, factor).Sample((a, b) =>
        {
            var pa = Polynomial.FromAscending(a);
            var pb = Polynomial.FromAscending(b);
            var union = PolynomialRoots.Find(pa).Concat(PolynomialRoots.Find(pb)).ToArray();
            if (MinimumGap(union) < 1e-3)
            {
                return; // nearly shared roots are ill-conditioned; their accuracy is covered by the cluster tests
            }

            var roots = PolynomialRoots.Find(pa * pb);
            Assert.True(RootTestMath.MaxMatchedRelativeDistance(union, roots) <= 1e-7);
        }, iter: 300);
    }

    private static Gen<Complex[]> SpreadRootsInBox() =>
        Gen.Select(Gen.Double[-3.0, 0.5], Gen.Double[0.0, 3.0], Gen.Bool, (x, y, pair) => pair ? new[] { new Complex(x, y), new Complex(x, -y) } : new[] { new Complex(x, 0) })
            .Array[2, 8]
            .Select(groups => groups.SelectMany(g => g).ToArray())
            .Where(roots => MinimumGap(roots) >= 0.1 && roots.Where(r => r.Imaginary != 0).All(r => Math.Abs(r.Imaginary) >= 0.05));

    /// <summary>Distance from roots[i] to the nearest other entry (0 for a repeated root).</summary>
    private static double Separation(Complex[] roots, int i) =>
        roots.Where((_, j) => j != i).Select(r => Complex.Abs(r - roots[i])).DefaultIfEmpty(double.PositiveInfinity).Min();

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
