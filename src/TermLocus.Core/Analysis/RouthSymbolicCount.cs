using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The Routh array's sign counts with every entry kept as a series in ε (see <see cref="EpsilonSeries"/>), used when
/// the floating-point array needed ε: the textbook ε method taken literally, each zero pivot replaced by ε itself,
/// signs read as ε → 0+. (Even done exactly, the ε method can miscount when several rows need ε; checked against
/// an exact symbolic computation, that is what remains of its errors.)
/// </summary>
internal static class RouthSymbolicCount
{
    /// <summary>
    /// Right-half-plane and imaginary-axis counts, by the same rules as the numeric array; null when a pivot is
    /// tiny but not zero, where carrying its reciprocal would overflow the series (the numeric array's lift to ε
    /// is the better answer there).
    /// </summary>
    public static (int RightHalfPlane, int ImaginaryAxis)? TryCount(Polynomial p, double relativeZeroTolerance, double epsilonRelative)
    {
        int n = p.Degree;
        int width = (n / 2) + 1;
        int length = (2 * n) + 4;
        var rows = new EpsilonSeries[n + 1][];
        rows[0] = CoefficientRow(p, n, width, length);
        int firstAuxiliary = -1;
        for (int i = 1; i <= n; i++)
        {
            var row = i == 1 ? CoefficientRow(p, n - 1, width, length) : NextRow(rows[i - 2], rows[i - 1], relativeZeroTolerance);
            if (row.All(x => x.IsZero))
            {
                row = AuxiliaryDerivative(rows[i - 1], n - i + 1);
                firstAuxiliary = firstAuxiliary < 0 ? i : firstAuxiliary;
            }
            else if (row[0].IsZero)
            {
                row[0] = EpsilonSeries.Monomial(1.0, 1, length);
            }
            else if (IsNegligiblePivot(row, epsilonRelative))
            {
                return null;
            }

            rows[i] = row;
        }

        int rhp = SignChanges(rows, 0);
        int axis = firstAuxiliary < 0 ? 0 : Math.Max(0, n - firstAuxiliary + 1 - (2 * SignChanges(rows, firstAuxiliary - 1)));
        return (rhp, axis);
    }

    /// <summary>A pivot negligible next to the other entries of its own order in ε.</summary>
    private static bool IsNegligiblePivot(EpsilonSeries[] row, double epsilonRelative)
    {
        var pivot = row[0];
        double others = row.Skip(1).Where(x => !x.IsZero && x.Valuation == pivot.Valuation).Select(x => Math.Abs(x.Leading)).DefaultIfEmpty(0.0).Max();
        return Math.Abs(pivot.Leading) <= epsilonRelative * others;
    }

    private static EpsilonSeries[] CoefficientRow(Polynomial p, int top, int width, int length)
    {
        var row = new EpsilonSeries[width];
        for (int j = 0; j < width; j++)
        {
            row[j] = EpsilonSeries.Constant(top - (2 * j) >= 0 ? p[top - (2 * j)] : 0.0, length);
        }

        return row;
    }

    private static EpsilonSeries[] NextRow(EpsilonSeries[] above2, EpsilonSeries[] above1, double relativeZeroTolerance)
    {
        int width = above1.Length;
        var row = new EpsilonSeries[width];
        int length = above1[0].Coefficients.Length;
        for (int j = 0; j < width; j++)
        {
            row[j] = j + 1 < width
                ? EpsilonSeries.CrossDifferenceOver(above1[0], above2[j + 1], above2[0], above1[j + 1], above1[0], relativeZeroTolerance)
                : EpsilonSeries.Constant(0.0, length);
        }

        return row;
    }

    private static EpsilonSeries[] AuxiliaryDerivative(EpsilonSeries[] above, int power)
    {
        var row = new EpsilonSeries[above.Length];
        for (int j = 0; j < above.Length; j++)
        {
            row[j] = above[j].Times(power - (2 * j) > 0 ? power - (2 * j) : 0.0);
        }

        return row;
    }

    private static int SignChanges(EpsilonSeries[][] rows, int from)
    {
        int changes = 0;
        for (int i = from + 1; i < rows.Length; i++)
        {
            if (rows[i][0].Sign != rows[i - 1][0].Sign)
            {
                changes++;
            }
        }

        return changes;
    }
}
