namespace TermLocus.Core.Algebra;

/// <summary>
/// Newton polishing of root estimates on a polynomial's own coefficients, and the componentwise backward error
/// η(t) = |P(t)| / Σ|b_k||t|^k (the smallest relative change of the coefficients that makes t an exact root;
/// Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed., on polynomial evaluation, from memory).
/// Outside the unit disc the reversed polynomial t^-m·P(t) is evaluated instead, so large roots neither overflow
/// nor lose relative accuracy.
/// </summary>
internal static class RootPolisher
{
    private const double Eps = 2.220446049250313e-16;

    /// <summary>Below this backward error a Newton step cannot help: the residual is rounding noise.</summary>
    private const double RoundingLevel = 2.0 * Eps;

    /// <summary>
    /// Polishes, in place, every estimate with im &gt;= 0 (the lower members of conjugate pairs are left for the
    /// caller to mirror). A step is kept only when it lowers η and moves less than half the distance to the nearest
    /// other estimate, so a cluster never collapses onto one root and a complex root never crosses the real axis.
    /// </summary>
    /// <returns>The worst backward error of the estimates afterwards.</returns>
    public static double Polish(ReadOnlySpan<double> b, Span<double> re, Span<double> im, int maxSteps)
    {
        if (maxSteps == 0)
        {
            return WorstBackwardError(b, re, im);
        }

        double worst = 0.0;
        for (int i = 0; i < re.Length; i++)
        {
            if (im[i] < 0.0)
            {
                continue;
            }

            double nearest2 = NearestDistanceSquared(re, im, i);
            double eta = im[i] == 0.0
                ? PolishReal(b, ref re[i], nearest2, maxSteps)
                : PolishComplex(b, ref re[i], ref im[i], nearest2, maxSteps);
            worst = double.IsNaN(eta) ? double.PositiveInfinity : Math.Max(worst, eta);
        }

        return worst;
    }

    /// <summary>The backward error η at t = tr + j·ti; 0 when both P(t) and the bound vanish.</summary>
    public static double BackwardError(ReadOnlySpan<double> b, double tr, double ti)
    {
        NewtonComplex(b, tr, ti, out _, out _, out double eta);
        return eta;
    }

    private static double NearestDistanceSquared(ReadOnlySpan<double> re, ReadOnlySpan<double> im, int i)
    {
        double best = double.PositiveInfinity;
        for (int j = 0; j < re.Length; j++)
        {
            if (j != i)
            {
                double dr = re[j] - re[i], di = im[j] - im[i];
                best = Math.Min(best, (dr * dr) + (di * di));
            }
        }

        return best;
    }

    private static double PolishReal(ReadOnlySpan<double> b, ref double t, double nearest2, int maxSteps)
    {
        NewtonReal(b, t, out double step, out double eta);
        for (int k = 0; k < maxSteps && eta > RoundingLevel; k++)
        {
            if (!double.IsFinite(step) || 4.0 * step * step >= nearest2)
            {
                break;
            }

            double next = t - step;
            NewtonReal(b, next, out double nextStep, out double nextEta);
            if (!(nextEta < eta))
            {
                break;
            }

            (t, step, eta) = (next, nextStep, nextEta);
        }

        return eta;
    }

    private static double PolishComplex(ReadOnlySpan<double> b, ref double tr, ref double ti, double nearest2, int maxSteps)
    {
        NewtonComplex(b, tr, ti, out double sr, out double si, out double eta);
        for (int k = 0; k < maxSteps && eta > RoundingLevel; k++)
        {
            if (!double.IsFinite(sr) || !double.IsFinite(si) || 4.0 * ((sr * sr) + (si * si)) >= nearest2)
            {
                break;
            }

            double nr = tr - sr, ni = ti - si;
            NewtonComplex(b, nr, ni, out double nsr, out double nsi, out double nextEta);
            if (!(nextEta < eta))
            {
                break;
            }

            (tr, ti, sr, si, eta) = (nr, ni, nsr, nsi, nextEta);
        }

        return eta;
    }

    /// <summary>Newton step P/P' at real t and the backward error there.</summary>
    internal static void NewtonReal(ReadOnlySpan<double> b, double t, out double step, out double eta)
    {
        int m = b.Length - 1;
        if (Math.Abs(t) <= 1.0)
        {
            double p = b[m], dp = 0.0, bound = Math.Abs(b[m]), at = Math.Abs(t);
            for (int k = m - 1; k >= 0; k--)
            {
                dp = (dp * t) + p;
                p = (p * t) + b[k];
                bound = (bound * at) + Math.Abs(b[k]);
            }

            step = p / dp;
            eta = Ratio(Math.Abs(p), bound);
        }
        else
        {
            // R(u) = Σ b[m-j] u^j = t^-m P(t) with u = 1/t; P/P' = t·R / (m·R - u·R').
            double u = 1.0 / t, au = Math.Abs(u);
            double r = b[0], dr = 0.0, bound = Math.Abs(b[0]);
            for (int j = m - 1; j >= 0; j--)
            {
                dr = (dr * u) + r;
                r = (r * u) + b[m - j];
                bound = (bound * au) + Math.Abs(b[m - j]);
            }

            step = t * r / ((m * r) - (u * dr));
            eta = Ratio(Math.Abs(r), bound);
        }
    }

    /// <summary>Newton step P/P' at complex t = tr + j·ti and the backward error there.</summary>
    internal static void NewtonComplex(ReadOnlySpan<double> b, double tr, double ti, out double sr, out double si, out double eta)
    {
        int m = b.Length - 1;
        double absT = Hypot(tr, ti);
        if (absT <= 1.0)
        {
            double pr = b[m], pi = 0.0, dr = 0.0, di = 0.0, bound = Math.Abs(b[m]);
            for (int k = m - 1; k >= 0; k--)
            {
                (dr, di) = ((dr * tr) - (di * ti) + pr, (dr * ti) + (di * tr) + pi);
                (pr, pi) = ((pr * tr) - (pi * ti) + b[k], (pr * ti) + (pi * tr));
                bound = (bound * absT) + Math.Abs(b[k]);
            }

            (sr, si) = Divide(pr, pi, dr, di);
            eta = Ratio(Hypot(pr, pi), bound);
            return;
        }

        (double ur, double ui) = Divide(1.0, 0.0, tr, ti);
        double au = 1.0 / absT;
        double rr = b[0], ri = 0.0, qr = 0.0, qi = 0.0, rb = Math.Abs(b[0]);
        for (int j = m - 1; j >= 0; j--)
        {
            (qr, qi) = ((qr * ur) - (qi * ui) + rr, (qr * ui) + (qi * ur) + ri);
            (rr, ri) = ((rr * ur) - (ri * ui) + b[m - j], (rr * ui) + (ri * ur));
            rb = (rb * au) + Math.Abs(b[m - j]);
        }

        // P/P' = t·R / (m·R - u·R')
        double denR = (m * rr) - ((ur * qr) - (ui * qi));
        double denI = (m * ri) - ((ur * qi) + (ui * qr));
        (double numR, double numI) = ((tr * rr) - (ti * ri), (tr * ri) + (ti * rr));
        (sr, si) = Divide(numR, numI, denR, denI);
        eta = Ratio(Hypot(rr, ri), rb);
    }

    private static double Ratio(double residual, double bound) => bound == 0.0 ? 0.0 : residual / bound;

    private static double Hypot(double x, double y) => double.Hypot(x, y);

    /// <summary>(a + jb)/(c + jd) by Smith's algorithm, which avoids needless overflow.</summary>
    internal static (double Re, double Im) Divide(double a, double b, double c, double d)
    {
        if (Math.Abs(d) <= Math.Abs(c))
        {
            double r = d / c, den = c + (d * r);
            return ((a + (b * r)) / den, (b - (a * r)) / den);
        }
        else
        {
            double r = c / d, den = (c * r) + d;
            return (((a * r) + b) / den, ((b * r) - a) / den);
        }
    }

    /// <summary>Overwrites the lower-half-plane slots, in order, with the mirrors of the upper-half ones.</summary>
    internal static void MirrorLowerHalf(Span<double> re, Span<double> im)
    {
        int lower = 0;
        for (int i = 0; i < re.Length; i++)
        {
            if (im[i] <= 0.0)
            {
                continue;
            }

            while (lower < re.Length && !(im[lower] < 0.0))
            {
                lower++;
            }

            if (lower == re.Length)
            {
                return;
            }

            re[lower] = re[i];
            im[lower] = -im[i];
            lower++;
        }
    }

    internal static double WorstBackwardError(ReadOnlySpan<double> b, ReadOnlySpan<double> re, ReadOnlySpan<double> im)
    {
        double worst = 0.0;
        for (int i = 0; i < re.Length; i++)
        {
            if (im[i] >= 0.0)
            {
                worst = Math.Max(worst, RootPolisher.BackwardError(b, re[i], im[i]));
            }
        }

        return worst;
    }
}
