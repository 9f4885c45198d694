using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Tests.Algebra;

/// <summary>Test-side yardsticks, written independently of the code under test.</summary>
internal static class RootTestMath
{
    /// <summary>
    /// Componentwise backward error |P(z)| / Σ|a_k||z|^k (Higham, Accuracy and Stability of Numerical Algorithms,
    /// 2nd ed., polynomial evaluation chapter, from memory), summed term by term rather than by Horner's rule; both
    /// sums are divided by |z|^n first when |z| &gt; 1 so nothing overflows.
    /// </summary>
    public static double BackwardError(Polynomial p, Complex z)
    {
        double r = Complex.Abs(z);
        int n = p.Degree;
        var unit = r == 0.0 ? Complex.Zero : z / r;
        Complex sum = Complex.Zero;
        double bound = 0.0;
        for (int k = 0; k <= n; k++)
        {
            double weight = r <= 1.0 ? Math.Pow(r, k) : Math.Pow(r, k - n);
            Complex direction = r == 0.0 ? (k == 0 ? Complex.One : Complex.Zero) : Complex.Pow(unit, k);
            sum += p[k] * weight * direction;
            bound += Math.Abs(p[k]) * weight;
        }

        return bound == 0.0 ? 0.0 : Complex.Abs(sum) / bound;
    }

    /// <summary>
    /// Pairs each expected root with the nearest unused computed root (greedy) and returns the largest distance,
    /// each distance divided by max(1, |expected|).
    /// </summary>
    public static double MaxMatchedRelativeDistance(IReadOnlyList<Complex> expected, IReadOnlyList<Complex> actual)
    {
        Assert.Equal(expected.Count, actual.Count);
        var used = new bool[actual.Count];
        double worst = 0.0;
        foreach (var e in expected.OrderByDescending(Complex.Abs))
        {
            int best = -1;
            for (int j = 0; j < actual.Count; j++)
            {
                if (!used[j] && (best < 0 || Complex.Abs(actual[j] - e) < Complex.Abs(actual[best] - e)))
                {
                    best = j;
                }
            }

            used[best] = true;
            worst = Math.Max(worst, Complex.Abs(actual[best] - e) / Math.Max(1.0, Complex.Abs(e)));
        }

        return worst;
    }

    /// <summary>Asserts the output contract: sorted, real roots exactly real, complex roots in exact conjugate pairs.</summary>
    public static void AssertWellFormed(IReadOnlyList<Complex> roots)
    {
        for (int i = 1; i < roots.Count; i++)
        {
            var (a, b) = (roots[i - 1], roots[i]);
            Assert.True(a.Real < b.Real || (a.Real == b.Real && a.Imaginary <= b.Imaginary), $"not sorted at {i}");
        }

        var upper = roots.Where(z => z.Imaginary > 0).OrderBy(z => z.Real).ThenBy(z => z.Imaginary).ToList();
        var lower = roots.Where(z => z.Imaginary < 0).Select(Complex.Conjugate).OrderBy(z => z.Real).ThenBy(z => z.Imaginary).ToList();
        Assert.Equal(upper, lower);
    }

    /// <summary>The companion matrix of p straight into MathNet's general eigenvalue solver, no scaling or balancing.</summary>
    public static Complex[] MathNetCompanionEigenvalues(Polynomial p)
    {
        int n = p.Degree;
        var m = MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.Dense(n, n);
        for (int i = 0; i < n; i++)
        {
            m[0, i] = -p[n - 1 - i] / p.Leading;
            if (i > 0)
            {
                m[i, i - 1] = 1.0;
            }
        }

        return m.Evd().EigenValues.ToArray();
    }
}
