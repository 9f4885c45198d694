using TermLocus.Core.Algebra;

namespace TermLocus.Core.Tests.Analysis;

/// <summary>
/// An independent stability check for the tests: the Routh–Hurwitz criterion, written out as in the textbooks
/// (Ogata, Modern Control Engineering, 5th ed., Section 5-6; common practice). Counts sign changes in the first
/// column of the Routh array; a zero in the first column is reported as "not strictly stable".
/// </summary>
internal static class RouthReference
{
    /// <summary>True when every root of p lies strictly in the left half-plane.</summary>
    internal static bool IsStrictlyStable(Polynomial p)
    {
        int n = p.Degree;
        if (n < 1)
        {
            return n == 0;
        }

        var rows = new List<double[]>();
        int width = (n / 2) + 1;
        var first = new double[width];
        var second = new double[width];
        for (int k = 0; k <= n; k++)
        {
            // Descending coefficient a_k of s^(n−k) goes to row k % 2.
            (k % 2 == 0 ? first : second)[k / 2] = p[n - k];
        }

        rows.Add(first);
        rows.Add(second);
        for (int r = 2; r <= n; r++)
        {
            var above = rows[r - 1];
            var twoAbove = rows[r - 2];
            if (above[0] == 0.0)
            {
                return false;
            }

            var row = new double[width];
            for (int j = 0; j + 1 < width; j++)
            {
                row[j] = ((above[0] * twoAbove[j + 1]) - (twoAbove[0] * above[j + 1])) / above[0];
            }

            rows.Add(row);
        }

        double sign = Math.Sign(rows[0][0]);
        return sign != 0 && rows.Take(n + 1).All(row => Math.Sign(row[0]) == sign);
    }
}
