using System.Numerics;
using MathNet.Numerics.LinearAlgebra;

namespace TermLocus.Core.Algebra;

/// <summary>
/// Roots of real polynomials. The first version uses the companion matrix's eigenvalues through MathNet;
/// balancing, scaling and Newton polishing come with the root-finding work.
/// </summary>
public static class PolynomialRoots
{
    /// <summary>
    /// All finite roots of <paramref name="p"/> (Degree of them), complex roots in conjugate pairs,
    /// sorted by real part then imaginary part. Throws <see cref="ArgumentException"/> for the zero polynomial.
    /// </summary>
    public static Complex[] Find(Polynomial p)
    {
        if (p.IsZero)
        {
            throw new ArgumentException("The zero polynomial has no isolated roots.", nameof(p));
        }

        int n = p.Degree;
        if (n == 0)
        {
            return [];
        }

        var m = Matrix<double>.Build.Dense(n, n);
        double lead = p.Leading;
        for (int i = 0; i < n; i++)
        {
            m[0, i] = -p[n - 1 - i] / lead;
            if (i > 0)
            {
                m[i, i - 1] = 1.0;
            }
        }

        var roots = m.Evd().EigenValues.ToArray();
        Array.Sort(roots, (a, b) => a.Real != b.Real ? a.Real.CompareTo(b.Real) : a.Imaginary.CompareTo(b.Imaginary));
        return roots;
    }
}
