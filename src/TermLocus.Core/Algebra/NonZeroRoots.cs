using System.Numerics;

namespace TermLocus.Core.Algebra;

/// <summary>
/// The working core of <see cref="PolynomialRoots"/> for a polynomial with no root at the origin: scale the
/// variable, solve (closed form or companion eigenvalues), polish, unscale, mirror conjugates.
/// </summary>
internal static class NonZeroRoots
{
    private const int StackLimit = 256;

    /// <summary>
    /// Finds the roots of <paramref name="solved"/> (ascending, first and last coefficient non-zero, degree m &gt;= 1)
    /// and polishes them on <paramref name="polished"/>, which is <paramref name="solved"/> itself or the same
    /// polynomial with extra leading terms that were judged negligible. Writes m roots, unsorted.
    /// </summary>
    public static bool TrySolve(
        ReadOnlySpan<double> solved, ReadOnlySpan<double> polished, Span<Complex> destination, RootFindingOptions options)
    {
        int m = solved.Length - 1;
        int full = polished.Length - 1;
        int e = ScaleExponent(solved);
        Span<double> b = full < StackLimit ? stackalloc double[full + 1] : new double[full + 1];
        if (!TryScale(polished, e, b))
        {
            e = 0;
            if (!TryScale(polished, e, b))
            {
                return false;
            }
        }

        Span<double> re = m < StackLimit ? stackalloc double[m] : new double[m];
        Span<double> im = m < StackLimit ? stackalloc double[m] : new double[m];
        if (!TryEstimate(b[..(m + 1)], re, im, options))
        {
            return false;
        }

        // Closed forms are already as good as the data when nothing was cut off; the eigenvalues are not.
        if (m > 2 || full > m)
        {
            double worst = RootPolisher.Polish(b, re, im, options.MaxPolishSteps);
            Repair(b[..(m + 1)], b, re, im, worst, options);
        }

        return TryEmit(re, im, e, destination);
    }

    /// <summary>Rounds of second and third opinions while some root's backward error stays above the repair level.</summary>
    private static void Repair(
        ReadOnlySpan<double> solved, ReadOnlySpan<double> full, Span<double> re, Span<double> im, double worst, RootFindingOptions options)
    {
        for (int round = 0; round < options.MaxRepairRounds && worst > options.RepairBackwardError; round++)
        {
            ReversedRepair.Run(solved, full, re, im, options);
            double now = DeflationRepair.Run(solved, full, re, im, options);
            if (now <= options.RepairBackwardError || !(now < worst))
            {
                return;
            }

            worst = now;
        }
    }

    /// <summary>The power of two nearest the geometric mean of the root magnitudes, (|a0|/|am|)^(1/m).</summary>
    internal static int ScaleExponent(ReadOnlySpan<double> a)
    {
        int m = a.Length - 1;
        double log2Ratio = Math.ILogB(a[0]) - Math.ILogB(a[m]);
        return (int)Math.Round(log2Ratio / m);
    }

    /// <summary>b_k = a_k·2^(e·k): the same polynomial in t = s/2^e, exact barring overflow or underflow.</summary>
    internal static bool TryScale(ReadOnlySpan<double> a, int e, Span<double> b)
    {
        for (int k = 0; k < a.Length; k++)
        {
            b[k] = Math.ScaleB(a[k], e * k);
            if (!double.IsFinite(b[k]) || (a[k] != 0.0 && b[k] == 0.0))
            {
                return false;
            }
        }

        return true;
    }

    internal static bool TryEstimate(ReadOnlySpan<double> b, Span<double> re, Span<double> im, RootFindingOptions options)
    {
        int m = b.Length - 1;
        if (m == 1)
        {
            re[0] = -b[0] / b[1];
            im[0] = 0.0;
            return double.IsFinite(re[0]);
        }

        if (m == 2)
        {
            QuadraticRoots.Solve(b[0], b[1], b[2], re, im);
            return double.IsFinite(re[0]) && double.IsFinite(re[1]) && double.IsFinite(im[1]);
        }

        Span<double> monic = m < StackLimit ? stackalloc double[m] : new double[m];
        for (int k = 0; k < m; k++)
        {
            monic[k] = b[k] / b[m];
            if (!double.IsFinite(monic[k]))
            {
                return false;
            }
        }

        return CompanionEigenvalues.Solve(monic, re, im, options.MaxQrIterationsPerRoot);
    }

    /// <summary>
    /// Writes each real root and each upper-half-plane root with its mirror image, unscaled by 2^e; the estimates
    /// below the axis are only placeholders for the mirrors. Fails if the halves do not pair up.
    /// </summary>
    private static bool TryEmit(ReadOnlySpan<double> re, ReadOnlySpan<double> im, int e, Span<Complex> destination)
    {
        int count = 0;
        for (int i = 0; i < re.Length; i++)
        {
            if (im[i] < 0.0)
            {
                continue;
            }

            if (count + (im[i] > 0.0 ? 2 : 1) > destination.Length)
            {
                return false;
            }

            double r = Math.ScaleB(re[i], e), y = Math.ScaleB(im[i], e);
            if (im[i] > 0.0)
            {
                destination[count++] = new Complex(r, -y);
                destination[count++] = new Complex(r, y);
            }
            else
            {
                destination[count++] = new Complex(r, 0.0);
            }
        }

        return count == destination.Length;
    }
}
