using TermLocus.Core.Algebra;

namespace TermLocus.Core.Tests.Fuzz;

/// <summary>Bounds on root magnitudes, computed apart from the code under test.</summary>
internal static class RootBounds
{
    /// <summary>
    /// log10 of Fujiwara's bound 2·max(|a(n-1)/a(n)|, |a(n-2)/a(n)|^(1/2), …, |a(0)/(2a(n))|^(1/n)) on the magnitude
    /// of every root (M. Fujiwara, Tôhoku Math. J. 10, 1916, from memory), in logarithms so it cannot overflow.
    /// </summary>
    public static double Log10Fujiwara(Polynomial p)
    {
        int n = p.Degree;
        double logLeading = Math.Log10(Math.Abs(p.Leading));
        double bound = double.NegativeInfinity;
        for (int k = 1; k <= n; k++)
        {
            double c = Math.Abs(p[n - k]) / (k == n ? 2.0 : 1.0);
            if (c > 0.0)
            {
                bound = Math.Max(bound, (Math.Log10(c) - logLeading) / k);
            }
        }

        return bound + Math.Log10(2.0);
    }

    /// <summary>log10 of the largest over the smallest magnitude of the non-zero coefficients.</summary>
    public static double Log10Spread(Polynomial p)
    {
        var logs = p.Coefficients.Where(c => c != 0.0).Select(c => Math.Log10(Math.Abs(c))).ToArray();
        return logs.Max() - logs.Min();
    }
}
