namespace TermLocus.Core.Algebra;

/// <summary>
/// Third opinion for roots that neither the companion matrix nor its reversed twin resolves, typically the middle
/// roots of a polynomial whose roots span 1e-15..1e15: the roots already found to the repair level are divided out
/// of the polynomial (large ones from the constant end, small ones from the leading end, the stable direction for
/// each; Peters and Wilkinson, from memory), the quotient, whose roots now span a modest range, is solved afresh,
/// and its roots are polished on the whole polynomial. The new set replaces the old only if its worst backward
/// error is lower.
/// </summary>
internal static class DeflationRepair
{
    private const int StackLimit = 256;

    /// <summary>Runs one round on <paramref name="re"/>/<paramref name="im"/> in place; returns the worst backward error after it.</summary>
    public static double Run(
        ReadOnlySpan<double> solved, ReadOnlySpan<double> full, Span<double> re, Span<double> im, RootFindingOptions options)
    {
        RootPolisher.MirrorLowerHalf(re, im);
        double worst = RootPolisher.WorstBackwardError(full, re, im);
        double level = options.RepairBackwardError;
        int m = re.Length;
        if (worst <= level)
        {
            return worst;
        }

        Span<double> work = m < StackLimit ? stackalloc double[(6 * m) + 2] : new double[(6 * m) + 2];
        Span<double> quotient = work[..(m + 1)], scratch = work[(m + 1)..((2 * m) + 2)];
        Span<double> outRe = work[((2 * m) + 2)..((3 * m) + 2)], outIm = work[((3 * m) + 2)..((4 * m) + 2)];
        Span<double> newRe = work[((4 * m) + 2)..((5 * m) + 2)], newIm = work[((5 * m) + 2)..];
        solved.CopyTo(quotient);
        int found = DeflateAccurateRoots(full, re, im, level, quotient, scratch, outRe, outIm);
        int rest = m - found;
        if (found == 0 || rest == 0 || !TryEstimateQuotient(quotient[..(rest + 1)], newRe[..rest], newIm[..rest], options))
        {
            return worst;
        }

        RootPolisher.Polish(full, newRe[..rest], newIm[..rest], options.MaxPolishSteps);
        RootPolisher.MirrorLowerHalf(newRe[..rest], newIm[..rest]);
        newRe[..rest].CopyTo(outRe[found..]);
        newIm[..rest].CopyTo(outIm[found..]);
        double joined = RootPolisher.WorstBackwardError(full, outRe, outIm);
        if (!(joined < worst))
        {
            return worst;
        }

        outRe.CopyTo(re);
        outIm.CopyTo(im);
        return joined;
    }

    /// <summary>
    /// Copies every root at or below the repair level (with its mirror) to the front of outRe/outIm and divides it
    /// out of <paramref name="quotient"/>; returns how many roots that is.
    /// </summary>
    private static int DeflateAccurateRoots(
        ReadOnlySpan<double> full, ReadOnlySpan<double> re, ReadOnlySpan<double> im, double level,
        Span<double> quotient, Span<double> scratch, Span<double> outRe, Span<double> outIm)
    {
        int degree = re.Length, found = 0;
        for (int i = 0; i < re.Length; i++)
        {
            if (im[i] < 0.0 || !(RootPolisher.BackwardError(full, re[i], im[i]) <= level))
            {
                continue;
            }

            if (im[i] == 0.0)
            {
                DivideLinear(quotient[..(degree + 1)], re[i], scratch);
                degree--;
                (outRe[found], outIm[found]) = (re[i], 0.0);
                found++;
            }
            else
            {
                DivideQuadratic(quotient[..(degree + 1)], re[i], im[i], scratch);
                degree -= 2;
                (outRe[found], outIm[found]) = (re[i], -im[i]);
                (outRe[found + 1], outIm[found + 1]) = (re[i], im[i]);
                found += 2;
            }

            scratch[..(degree + 1)].CopyTo(quotient);
        }

        return found;
    }

    /// <summary>Q with P(t) = (t - r)·Q(t) + remainder, into q[..d] for P of degree d.</summary>
    private static void DivideLinear(ReadOnlySpan<double> p, double r, Span<double> q)
    {
        int d = p.Length - 1;
        if (Math.Abs(r) <= 1.0)
        {
            q[d - 1] = p[d];
            for (int k = d - 1; k >= 1; k--)
            {
                q[k - 1] = p[k] + (r * q[k]);
            }
        }
        else
        {
            q[0] = -p[0] / r;
            for (int k = 1; k < d; k++)
            {
                q[k] = (q[k - 1] - p[k]) / r;
            }
        }
    }

    /// <summary>Q with P(t) = (t² - 2x·t + x² + y²)·Q(t) + remainder, into q[..(d-1)] for P of degree d.</summary>
    private static void DivideQuadratic(ReadOnlySpan<double> p, double x, double y, Span<double> q)
    {
        int d = p.Length - 1;
        double b = -2.0 * x, c = (x * x) + (y * y);
        if (c <= 1.0)
        {
            for (int j = d - 2; j >= 0; j--)
            {
                double q1 = j + 1 <= d - 2 ? q[j + 1] : 0.0;
                double q2 = j + 2 <= d - 2 ? q[j + 2] : 0.0;
                q[j] = p[j + 2] - (b * q1) - (c * q2);
            }
        }
        else
        {
            for (int j = 0; j <= d - 2; j++)
            {
                double q1 = j >= 1 ? q[j - 1] : 0.0;
                double q2 = j >= 2 ? q[j - 2] : 0.0;
                q[j] = (p[j] - q2 - (b * q1)) / c;
            }
        }
    }

    private static bool TryEstimateQuotient(ReadOnlySpan<double> quotient, Span<double> re, Span<double> im, RootFindingOptions options)
    {
        int d = quotient.Length - 1;
        if (quotient[0] == 0.0 || quotient[d] == 0.0 || !double.IsFinite(quotient[0]))
        {
            return false;
        }

        int e = NonZeroRoots.ScaleExponent(quotient);
        Span<double> scaled = d < StackLimit ? stackalloc double[d + 1] : new double[d + 1];
        if (!NonZeroRoots.TryScale(quotient, e, scaled) || !NonZeroRoots.TryEstimate(scaled, re, im, options))
        {
            return false;
        }

        for (int i = 0; i < d; i++)
        {
            re[i] = Math.ScaleB(re[i], e);
            im[i] = Math.ScaleB(im[i], e);
        }

        return true;
    }
}
