namespace TermLocus.Core.Algebra;

/// <summary>
/// Decides how many leading coefficients of a polynomial are negligible, i.e. how many roots sit "at infinity".
/// For a candidate count k, the remaining polynomial R (degree m-k) has all its roots inside its Fujiwara radius ρ;
/// the top k terms count as vanished when |q_j|·ρ^j is at most relTol times the largest |q_i|·ρ^i of R.
/// That comparison is dimensionless, so it does not depend on the unit of s. The smallest such k is taken.
/// When R would be a constant there is no root scale to compare with, and ρ = 1 (rad/s) is used.
/// </summary>
internal static class VanishingLeadingTerms
{
    /// <summary>
    /// The number of vanished leading coefficients of <paramref name="q"/> (ascending, q[0] and q[^1] non-zero,
    /// all finite), in [0, degree]; 0 when <paramref name="relTol"/> is 0.
    /// </summary>
    public static int Count(ReadOnlySpan<double> q, double relTol)
    {
        int m = q.Length - 1;
        if (relTol <= 0.0 || m < 1)
        {
            return 0;
        }

        Span<double> logAbs = m < 256 ? stackalloc double[m + 1] : new double[m + 1];
        for (int k = 0; k <= m; k++)
        {
            logAbs[k] = Math.Log(Math.Abs(q[k]));
        }

        double logTol = Math.Log(relTol);
        for (int k = 1; k <= m; k++)
        {
            int top = m - k;
            if (q[top] == 0.0)
            {
                continue;
            }

            double logRho = top == 0 ? 0.0 : LogFujiwaraBound(logAbs[..(top + 1)]);
            double kept = MaxTerm(logAbs, 0, top, logRho);
            double dropped = MaxTerm(logAbs, top + 1, m, logRho);
            if (dropped <= logTol + kept)
            {
                return k;
            }
        }

        return 0;
    }

    /// <summary>
    /// log of 2·max(|r[d-1]/r[d]|, |r[d-2]/r[d]|^(1/2), ..., |r[0]/(2r[d])|^(1/d)) for r of degree d &gt;= 1,
    /// given log|r_k| (minus infinity for zero coefficients).
    /// </summary>
    private static double LogFujiwaraBound(ReadOnlySpan<double> logAbs)
    {
        int d = logAbs.Length - 1;
        double best = double.NegativeInfinity;
        for (int j = 1; j <= d; j++)
        {
            double v = logAbs[d - j] - logAbs[d];
            if (j == d)
            {
                v -= Math.Log(2.0);
            }

            best = Math.Max(best, v / j);
        }

        return Math.Log(2.0) + best;
    }

    private static double MaxTerm(ReadOnlySpan<double> logAbs, int from, int to, double logRho)
    {
        double best = double.NegativeInfinity;
        for (int i = from; i <= to; i++)
        {
            best = Math.Max(best, logAbs[i] + (i * logRho));
        }

        return best;
    }
}
