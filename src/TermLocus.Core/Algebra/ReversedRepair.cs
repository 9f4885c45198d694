namespace TermLocus.Core.Algebra;

/// <summary>
/// Second opinion for polynomials whose roots span more orders of magnitude than a double can resolve at once.
/// The companion eigenvalues carry an absolute error of about ε times the largest root, which blurs the smallest
/// roots; the eigenvalues of the reversed polynomial (roots 1/t) blur the largest ones instead. Both sets are
/// polished, sorted by magnitude, and the smallest k roots of the reversed set are joined with the rest of the
/// forward set, k chosen (without splitting a conjugate pair) to minimise the worst backward error.
/// </summary>
internal static class ReversedRepair
{
    private const int StackLimit = 256;

    /// <summary>
    /// Improves <paramref name="re"/>/<paramref name="im"/> (roots of <paramref name="solved"/>, polished on
    /// <paramref name="full"/>) in place when their worst backward error exceeds the repair level; the lower
    /// members of pairs are mirrored on return.
    /// </summary>
    public static void Run(
        ReadOnlySpan<double> solved, ReadOnlySpan<double> full, Span<double> re, Span<double> im, RootFindingOptions options)
    {
        RootPolisher.MirrorLowerHalf(re, im);
        double worstForward = RootPolisher.WorstBackwardError(full, re, im);
        int m = re.Length;
        if (worstForward <= options.RepairBackwardError)
        {
            return;
        }

        Span<double> work = m <= StackLimit ? stackalloc double[7 * m] : new double[7 * m];
        Span<double> monic = work[..m], rr = work[m..(2 * m)], ri = work[(2 * m)..(3 * m)];
        Span<double> etaF = work[(3 * m)..(4 * m)], etaR = work[(4 * m)..(5 * m)];
        Span<double> sortedRe = work[(5 * m)..(6 * m)], sortedIm = work[(6 * m)..];
        for (int k = 0; k < m; k++)
        {
            monic[k] = solved[m - k] / solved[0];
        }

        if (!CompanionEigenvalues.Solve(monic, rr, ri, options.MaxQrIterationsPerRoot))
        {
            return;
        }

        Invert(rr, ri);
        RootPolisher.Polish(full, rr, ri, options.MaxPolishSteps);
        RootPolisher.MirrorLowerHalf(rr, ri);
        SortByMagnitude(re, im);
        SortByMagnitude(rr, ri);
        FillBackwardErrors(full, re, im, etaF);
        FillBackwardErrors(full, rr, ri, etaR);
        int split = BestSplit(re, im, rr, ri, etaF, etaR, out double worstJoined);
        if (worstJoined < worstForward)
        {
            rr[..split].CopyTo(sortedRe);
            ri[..split].CopyTo(sortedIm);
            re[split..].CopyTo(sortedRe[split..]);
            im[split..].CopyTo(sortedIm[split..]);
            sortedRe.CopyTo(re);
            sortedIm.CopyTo(im);
        }
    }

    /// <summary>
    /// t = 1/u. A u blurred to exactly 0 becomes ±∞ (real), which sorts last and carries an infinite backward
    /// error, so the join takes that root from the forward set.
    /// </summary>
    private static void Invert(Span<double> re, Span<double> im)
    {
        for (int i = 0; i < re.Length; i++)
        {
            if (im[i] == 0.0)
            {
                re[i] = 1.0 / re[i];
            }
            else
            {
                (re[i], im[i]) = RootPolisher.Divide(1.0, 0.0, re[i], im[i]);
            }
        }
    }

    private static int BestSplit(
        ReadOnlySpan<double> fr, ReadOnlySpan<double> fi, ReadOnlySpan<double> rr, ReadOnlySpan<double> ri,
        ReadOnlySpan<double> etaF, ReadOnlySpan<double> etaR, out double worstJoined)
    {
        int m = fr.Length;
        int best = 0;
        worstJoined = double.PositiveInfinity;
        double prefixR = 0.0;
        for (int k = 0; k <= m; k++)
        {
            if (k > 0)
            {
                prefixR = Math.Max(prefixR, etaR[k - 1]);
            }

            if (SplitsPair(fr, fi, k) || SplitsPair(rr, ri, k))
            {
                continue;
            }

            double suffixF = 0.0;
            for (int j = k; j < m; j++)
            {
                suffixF = Math.Max(suffixF, etaF[j]);
            }

            double worst = Math.Max(prefixR, suffixF);
            if (worst < worstJoined)
            {
                (best, worstJoined) = (k, worst);
            }
        }

        return best;
    }

    private static bool SplitsPair(ReadOnlySpan<double> re, ReadOnlySpan<double> im, int k) =>
        k > 0 && k < re.Length && im[k - 1] != 0.0 && re[k - 1] == re[k] && im[k - 1] == -im[k];

    private static void FillBackwardErrors(ReadOnlySpan<double> b, ReadOnlySpan<double> re, ReadOnlySpan<double> im, Span<double> eta)
    {
        for (int i = 0; i < re.Length; i++)
        {
            eta[i] = double.IsFinite(re[i]) && double.IsFinite(im[i])
                ? RootPolisher.BackwardError(b, re[i], Math.Abs(im[i]))
                : double.PositiveInfinity;
        }
    }

    /// <summary>Insertion sort by |t|, then by imaginary part, so each conjugate pair ends up adjacent.</summary>
    private static void SortByMagnitude(Span<double> re, Span<double> im)
    {
        for (int i = 1; i < re.Length; i++)
        {
            double xr = re[i], xi = im[i], key = double.Hypot(xr, xi);
            int j = i - 1;
            while (j >= 0 && (double.Hypot(re[j], im[j]) > key || (double.Hypot(re[j], im[j]) == key && im[j] > xi)))
            {
                re[j + 1] = re[j];
                im[j + 1] = im[j];
                j--;
            }

            re[j + 1] = xr;
            im[j + 1] = xi;
        }
    }
}
