using System.Buffers;
using MathNet.Numerics;
using MathNet.Numerics.LinearAlgebra;

namespace TermLocus.Core.Algebra;

/// <summary>
/// Eigenvalues of the companion matrix of a monic polynomial t^m + c[m-1]·t^(m-1) + ... + c[0], balanced first.
/// The companion matrix (negated coefficients in the first row, ones on the subdiagonal) is already upper
/// Hessenberg, and a diagonal similarity keeps that shape, so the balancing works on the two non-zero bands only.
/// </summary>
internal static class CompanionEigenvalues
{
    private const int StackMatrixLimit = 40 * 40;
    private const int MaxBalancingSweeps = 64;

    /// <summary>Largest balancing factor applied in one step (2^256): far past any useful balance, far from overflow.</summary>
    private const double MaxBalancingFactor = 1.157920892373162e77;

    /// <summary>
    /// Writes the m eigenvalues into <paramref name="re"/>/<paramref name="im"/> (complex pairs exactly conjugate,
    /// real ones with im exactly 0). Tries the Francis QR first and MathNet's general solver when that does not
    /// converge; returns false when both fail.
    /// </summary>
    public static bool Solve(ReadOnlySpan<double> monicLower, Span<double> re, Span<double> im, int maxIterations)
    {
        int m = monicLower.Length;
        Span<double> top = m <= 256 ? stackalloc double[m] : new double[m];
        Span<double> sub = m <= 256 ? stackalloc double[m] : new double[m];
        for (int j = 0; j < m; j++)
        {
            top[j] = -monicLower[m - 1 - j];
            sub[j] = 1.0;
        }

        Balance(top, sub[..(m - 1)]);

        double[]? rented = null;
        Span<double> a = m * m <= StackMatrixLimit
            ? stackalloc double[m * m]
            : (rented = ArrayPool<double>.Shared.Rent(m * m)).AsSpan(0, m * m);
        try
        {
            Fill(a, top, sub[..(m - 1)]);
            if (HessenbergQr.Eigenvalues(a, m, re, im, maxIterations))
            {
                return true;
            }

            Fill(a, top, sub[..(m - 1)]);
            return TryGeneralSolver(a, m, re, im);
        }
        finally
        {
            if (rented is not null)
            {
                ArrayPool<double>.Shared.Return(rented);
            }
        }
    }

    /// <summary>
    /// Parlett–Reinsch balancing with powers of two (exact): scales row i by 1/f and column i by f until every
    /// row's off-diagonal 1-norm is within a factor of 2 of its column's. <paramref name="top"/> is the first row
    /// (top[0] is the diagonal entry, which the similarity leaves alone); <paramref name="sub"/>[i] is entry (i+1, i).
    /// </summary>
    internal static void Balance(Span<double> top, Span<double> sub)
    {
        int m = top.Length;
        bool converged = false;
        for (int sweep = 0; !converged && sweep < MaxBalancingSweeps; sweep++)
        {
            converged = true;
            for (int i = 0; i < m; i++)
            {
                double r = i == 0 ? OffDiagonalSum(top) : Math.Abs(sub[i - 1]);
                double c = (i == 0 ? 0.0 : Math.Abs(top[i])) + (i < m - 1 ? Math.Abs(sub[i]) : 0.0);
                if (c == 0.0 || r == 0.0 || !double.IsFinite(c) || !double.IsFinite(r))
                {
                    continue;
                }

                double f = PowerOfTwoFactor(c, r, out bool worthIt);
                if (!worthIt)
                {
                    continue;
                }

                converged = false;
                ScaleRowAndColumn(top, sub, i, f);
            }
        }
    }

    private static double OffDiagonalSum(ReadOnlySpan<double> top)
    {
        double r = 0.0;
        for (int j = 1; j < top.Length; j++)
        {
            r += Math.Abs(top[j]);
        }

        return r;
    }

    private static double PowerOfTwoFactor(double c, double r, out bool worthIt)
    {
        double s = c + r;
        double f = 1.0;
        double g = r / 2.0;

        // Bounded: with c and r hundreds of decades apart an unbounded f overflowed to infinity, the next sweep saw an
        // infinite c, and c /= 4 never ended (a hang found by fuzzing, e.g. -1e267·s^3 + 1.3e-77·s^2 - 5e-155·s + 7e-233).
        while (c < g && f < MaxBalancingFactor)
        {
            f *= 2.0;
            c *= 4.0;
        }

        g = r * 2.0;
        while (c > g && f > 1.0 / MaxBalancingFactor)
        {
            f /= 2.0;
            c /= 4.0;
        }

        worthIt = (c + r) / f < 0.95 * s;
        return f;
    }

    private static void ScaleRowAndColumn(Span<double> top, Span<double> sub, int i, double f)
    {
        double g = 1.0 / f;
        if (i == 0)
        {
            for (int j = 1; j < top.Length; j++)
            {
                top[j] *= g;
            }
        }
        else
        {
            sub[i - 1] *= g;
            top[i] *= f;
        }

        if (i < sub.Length)
        {
            sub[i] *= f;
        }
    }

    private static void Fill(Span<double> a, ReadOnlySpan<double> top, ReadOnlySpan<double> sub)
    {
        int m = top.Length;
        a.Clear();
        top.CopyTo(a[..m]);
        for (int i = 0; i < sub.Length; i++)
        {
            a[((i + 1) * m) + i] = sub[i];
        }
    }

    private static bool TryGeneralSolver(ReadOnlySpan<double> a, int m, Span<double> re, Span<double> im)
    {
        var matrix = Matrix<double>.Build.Dense(m, m);
        for (int i = 0; i < m; i++)
        {
            for (int j = 0; j < m; j++)
            {
                matrix[i, j] = a[(i * m) + j];
            }
        }

        try
        {
            var values = matrix.Evd(Symmetricity.Asymmetric).EigenValues;
            for (int i = 0; i < m; i++)
            {
                re[i] = values[i].Real;
                im[i] = values[i].Imaginary;
                if (!double.IsFinite(re[i]) || !double.IsFinite(im[i]))
                {
                    return false;
                }
            }

            return true;
        }
        catch (NonConvergenceException)
        {
            return false;
        }
    }
}
