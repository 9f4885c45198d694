namespace TermLocus.Core.Algebra;

/// <summary>
/// Eigenvalues (no eigenvectors) of a real upper Hessenberg matrix by the Francis double-shift QR iteration,
/// the classic EISPACK <c>hqr</c> scheme: deflate when a subdiagonal entry is negligible next to its diagonal
/// neighbours, solve trailing 2x2 blocks in closed form, exceptional shifts every 10 iterations.
/// Works in place on a row-major n×n span; only the active window is updated, which is all eigenvalues need.
/// </summary>
internal static class HessenbergQr
{
    private const double Eps = 2.220446049250313e-16; // 2^-52, the spacing of doubles at 1

    /// <summary>
    /// Fills <paramref name="re"/>/<paramref name="im"/> with the n eigenvalues. Complex pairs are stored next to
    /// each other as exactly conjugate values (negative imaginary part first); real eigenvalues have im exactly 0.
    /// Returns false when one eigenvalue needs more than <paramref name="maxIterations"/> iterations.
    /// </summary>
    public static bool Eigenvalues(Span<double> a, int n, Span<double> re, Span<double> im, int maxIterations)
    {
        double norm = 0.0;
        for (int i = 0; i < n; i++)
        {
            for (int j = Math.Max(i - 1, 0); j < n; j++)
            {
                norm += Math.Abs(a[(i * n) + j]);
            }
        }

        int nn = n - 1;
        double shiftSum = 0.0;
        while (nn >= 0)
        {
            int its = 0;
            int l;
            do
            {
                l = SmallSubdiagonal(a, n, nn, norm);
                double x = a[(nn * n) + nn];
                if (l == nn)
                {
                    re[nn] = x + shiftSum;
                    im[nn] = 0.0;
                    nn--;
                }
                else if (l == nn - 1)
                {
                    TwoByTwo(a, n, nn, shiftSum, re, im);
                    nn -= 2;
                }
                else
                {
                    if (its == maxIterations)
                    {
                        return false;
                    }

                    DoubleShiftSweep(a, n, l, nn, its, ref shiftSum);
                    its++;
                }
            }
            while (l < nn - 1);
        }

        return true;
    }

    private static int SmallSubdiagonal(Span<double> a, int n, int nn, double norm)
    {
        for (int l = nn; l >= 1; l--)
        {
            double s = Math.Abs(a[((l - 1) * n) + l - 1]) + Math.Abs(a[(l * n) + l]);
            if (s == 0.0)
            {
                s = norm;
            }

            if (Math.Abs(a[(l * n) + l - 1]) <= Eps * s)
            {
                a[(l * n) + l - 1] = 0.0;
                return l;
            }
        }

        return 0;
    }

    private static void TwoByTwo(Span<double> a, int n, int nn, double shiftSum, Span<double> re, Span<double> im)
    {
        double x = a[(nn * n) + nn];
        double y = a[((nn - 1) * n) + nn - 1];
        double w = a[(nn * n) + nn - 1] * a[((nn - 1) * n) + nn];
        double p = 0.5 * (y - x);
        double q = (p * p) + w;
        double z = Math.Sqrt(Math.Abs(q));
        x += shiftSum;
        if (q >= 0.0)
        {
            // Real pair: the larger one from the sum without cancellation, the other from the product.
            z = p + Math.CopySign(z, p);
            re[nn - 1] = re[nn] = x + z;
            if (z != 0.0)
            {
                re[nn] = x - (w / z);
            }

            im[nn - 1] = im[nn] = 0.0;
        }
        else
        {
            re[nn - 1] = re[nn] = x + p;
            im[nn - 1] = -z;
            im[nn] = z;
        }
    }

    private static void DoubleShiftSweep(Span<double> a, int n, int l, int nn, int its, ref double shiftSum)
    {
        double x = a[(nn * n) + nn];
        double y = a[((nn - 1) * n) + nn - 1];
        double w = a[(nn * n) + nn - 1] * a[((nn - 1) * n) + nn];
        if (its > 0 && its % 10 == 0)
        {
            // Exceptional shift, to break the rare cycles of the standard Francis shift.
            shiftSum += x;
            for (int i = 0; i <= nn; i++)
            {
                a[(i * n) + i] -= x;
            }

            double s = Math.Abs(a[(nn * n) + nn - 1]) + Math.Abs(a[((nn - 1) * n) + nn - 2]);
            y = x = 0.75 * s;
            w = -0.4375 * s * s;
        }

        int m = FindBulgeStart(a, n, l, nn, x, y, w, out double p, out double q, out double r);
        for (int i = m + 2; i <= nn; i++)
        {
            a[(i * n) + i - 2] = 0.0;
            if (i != m + 2)
            {
                a[(i * n) + i - 3] = 0.0;
            }
        }

        ChaseBulge(a, n, l, m, nn, p, q, r);
    }

    private static int FindBulgeStart(
        Span<double> a, int n, int l, int nn, double x, double y, double w, out double p, out double q, out double r)
    {
        int m;
        for (m = nn - 2; ; m--)
        {
            double z = a[(m * n) + m];
            r = x - z;
            double s = y - z;
            p = (((r * s) - w) / a[((m + 1) * n) + m]) + a[(m * n) + m + 1];
            q = a[((m + 1) * n) + m + 1] - z - r - s;
            r = a[((m + 2) * n) + m + 1];
            s = Math.Abs(p) + Math.Abs(q) + Math.Abs(r);
            p /= s;
            q /= s;
            r /= s;
            if (m == l)
            {
                return m;
            }

            double u = Math.Abs(a[(m * n) + m - 1]) * (Math.Abs(q) + Math.Abs(r));
            double v = Math.Abs(p) * (Math.Abs(a[((m - 1) * n) + m - 1]) + Math.Abs(z) + Math.Abs(a[((m + 1) * n) + m + 1]));
            if (u <= Eps * v)
            {
                return m;
            }
        }
    }

    private static void ChaseBulge(Span<double> a, int n, int l, int m, int nn, double p, double q, double r)
    {
        double x = 0.0;
        for (int k = m; k <= nn - 1; k++)
        {
            if (k != m)
            {
                p = a[(k * n) + k - 1];
                q = a[((k + 1) * n) + k - 1];
                r = k != nn - 1 ? a[((k + 2) * n) + k - 1] : 0.0;
                x = Math.Abs(p) + Math.Abs(q) + Math.Abs(r);
                if (x != 0.0)
                {
                    p /= x;
                    q /= x;
                    r /= x;
                }
            }

            double s = Math.CopySign(Math.Sqrt((p * p) + (q * q) + (r * r)), p);
            if (s == 0.0)
            {
                continue;
            }

            if (k == m)
            {
                if (l != m)
                {
                    a[(k * n) + k - 1] = -a[(k * n) + k - 1];
                }
            }
            else
            {
                a[(k * n) + k - 1] = -s * x;
            }

            p += s;
            ApplyReflector(a, n, l, k, nn, p / s, q / s, r / s, q / p, r / p);
        }
    }

    private static void ApplyReflector(
        Span<double> a, int n, int l, int k, int nn, double x, double y, double z, double q, double r)
    {
        // Row offsets hoisted: this pair of loops is where the iteration spends its time.
        int r0 = k * n, r1 = r0 + n, r2 = r1 + n;
        if (k != nn - 1)
        {
            for (int j = k; j <= nn; j++)
            {
                double p = a[r0 + j] + (q * a[r1 + j]) + (r * a[r2 + j]);
                a[r2 + j] -= p * z;
                a[r1 + j] -= p * y;
                a[r0 + j] -= p * x;
            }
        }
        else
        {
            for (int j = k; j <= nn; j++)
            {
                double p = a[r0 + j] + (q * a[r1 + j]);
                a[r1 + j] -= p * y;
                a[r0 + j] -= p * x;
            }
        }

        int last = Math.Min(nn, k + 3);
        for (int i = l, row = l * n; i <= last; i++, row += n)
        {
            double p = (x * a[row + k]) + (y * a[row + k + 1]);
            if (k != nn - 1)
            {
                p += z * a[row + k + 2];
                a[row + k + 2] -= p * r;
            }

            a[row + k + 1] -= p * q;
            a[row + k] -= p;
        }
    }
}
