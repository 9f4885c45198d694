using System.Numerics;
using CsCheck;
using MathNet.Numerics.LinearAlgebra;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Analysis;

public class TraceRootRefinerTests
{
    [Fact]
    public void Warm_started_roots_agree_with_companion_matrix_eigenvalues()
    {
        // Reference: eigenvalues of the companion matrix computed directly with MathNet (a general-purpose library).
        // Distinct roots on a 1/8 grid (a multiple root may legitimately fail over to the eigenvalue solver).
        var roots = Gen.Select(Gen.Int[-40, 8], Gen.Int[0, 32]).Select((a, b) => (a / 8.0, b / 8.0)).Array[1, 6]
            .Select(pairs => pairs.SelectMany(p => p.Item2 < 0.5
                ? new[] { new Complex(p.Item1, 0), new Complex(p.Item1 - 1, 0) }
                : new[] { new Complex(p.Item1, p.Item2), new Complex(p.Item1, -p.Item2) }).ToArray())
            // Roots at least 0.25 apart: the warm starts (0.05 off) then lie nearest their own root, as they do when
            // tracing; closer clusters are the eigenvalue solver's job and made this check fail now and then.
            .Where(r => r.SelectMany((x, i) => r.Skip(i + 1).Select(y => Complex.Abs(x - y))).DefaultIfEmpty(1).Min() >= 0.25);
        roots.Sample(exact =>
        {
            var poly = Polynomial.FromRoots(exact);
            var z = exact.Select((r, i) => r + Complex.FromPolarCoordinates(0.05, i)).ToArray();

            Assert.True(TraceRootRefiner.TryRefine(poly.Coefficients.AsSpan(), z, 5.0), string.Join(" ", exact));
            var reference = CompanionEigenvalues(poly);
            foreach (var r in reference)
            {
                Assert.True(z.Min(x => Complex.Abs(x - r)) <= 1e-7 * 5, $"{r} missing");
            }
        }, iter: 200, threads: 1);
    }

    [Fact]
    public void A_double_root_at_the_origin_converges_despite_linear_convergence()
    {
        // s²(s² - 1): roots 0, 0, ±1 (common practice). Convergence to a double root is only linear; the absolute
        // floor on the step lets it finish anyway, with the double root to about √eps.
        var poly = Polynomial.FromAscending(0, 0, -1, 0, 1);
        var z = new[] { new Complex(0.05, 0.01), new Complex(-0.04, 0), new Complex(0.9, 0.1), new Complex(-1.1, 0) };
        Assert.True(TraceRootRefiner.TryRefine(poly.Coefficients.AsSpan(), z, 1.0));
        var sorted = z.OrderBy(x => x.Real).ToArray();
        Assert.Equal(-1.0, sorted[0].Real, 1e-12);
        Assert.Equal(0.0, sorted[1].Magnitude, 1e-7);
        Assert.Equal(0.0, sorted[2].Magnitude, 1e-7);
        Assert.Equal(1.0, sorted[3].Real, 1e-12);
    }

    [Fact]
    public void Real_starting_points_still_find_a_complex_pair()
    {
        // s² + 1 has roots ±j (common practice); both starts on the real axis, even the same point.
        var poly = Polynomial.FromAscending(1, 0, 1);
        var z = new[] { new Complex(0.3, 0), new Complex(0.3, 0) };
        Assert.True(TraceRootRefiner.TryRefine(poly.Coefficients.AsSpan(), z, 1.0));
        Assert.Equal(1.0, z.Max(x => x.Imaginary), 1e-12);
        Assert.Equal(-1.0, z.Min(x => x.Imaginary), 1e-12);
        Assert.All(z, x => Assert.Equal(0.0, x.Real, 1e-12));
    }

    private static Complex[] CompanionEigenvalues(Polynomial p)
    {
        int n = p.Degree;
        var m = Matrix<double>.Build.Dense(n, n, (i, j) => i == 0 ? -p[n - 1 - j] / p.Leading : i == j + 1 ? 1 : 0);
        return m.Evd().EigenValues.ToArray();
    }
}
