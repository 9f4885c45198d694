using MathNet.Numerics.LinearAlgebra;

namespace TermLocus.Core.Time;

/// <summary>
/// The matrix exponential e^A of a real square matrix, by scaling and squaring with diagonal Padé approximants
/// of degree 3, 5, 7, 9 or 13 (N. J. Higham, "The scaling and squaring method for the matrix exponential
/// revisited", SIAM J. Matrix Anal. Appl. 26(4), 2005, Algorithm 2.3). The degree and the number of squarings
/// are chosen from the 1-norm so that the truncation error is below double-precision unit roundoff
/// in exact arithmetic; the result is accurate to a few ulps relative to ‖e^A‖ for matrices that are not
/// badly non-normal.
/// </summary>
public static class MatrixExponential
{
    // Higham 2005, Table 2.3: largest 1-norm for which the [m/m] approximant meets unit roundoff 2^-53.
    private const double Theta3 = 1.495585217958292e-2;
    private const double Theta5 = 2.539398330063230e-1;
    private const double Theta7 = 9.504178996162932e-1;
    private const double Theta9 = 2.097847961257068e0;
    private const double Theta13 = 5.371920351148152e0;

    private static readonly double[] Pade3 = [120, 60, 12, 1];
    private static readonly double[] Pade5 = [30240, 15120, 3360, 420, 30, 1];
    private static readonly double[] Pade7 = [17297280, 8648640, 1995840, 277200, 25200, 1512, 56, 1];

    private static readonly double[] Pade9 =
        [17643225600, 8821612800, 2075673600, 302702400, 30270240, 2162160, 110880, 3960, 90, 1];

    private static readonly double[] Pade13 =
    [
        64764752532480000, 32382376266240000, 7771770303897600, 1187353796428800, 129060195264000,
        10559470521600, 670442572800, 33522128640, 1323241920, 40840800, 960960, 16380, 182, 1,
    ];

    /// <summary>
    /// e^A for a square matrix <paramref name="a"/> (any size, including 0×0). The input is not modified.
    /// Throws <see cref="ArgumentException"/> when <paramref name="a"/> is not square or holds a NaN or an
    /// infinity. Entries of the result may overflow to infinity when ‖A‖ is very large (above about 700).
    /// </summary>
    public static Matrix<double> Compute(Matrix<double> a)
    {
        ArgumentNullException.ThrowIfNull(a);
        if (a.RowCount != a.ColumnCount)
        {
            throw new ArgumentException($"Matrix must be square, got {a.RowCount}x{a.ColumnCount}.", nameof(a));
        }

        if (a.Enumerate().Any(x => !double.IsFinite(x)))
        {
            throw new ArgumentException("Matrix holds a NaN or an infinite entry.", nameof(a));
        }

        int n = a.RowCount;
        if (n == 0)
        {
            return a.Clone();
        }

        double norm = a.L1Norm();
        if (norm <= Theta3)
        {
            return LowDegree(a, Pade3);
        }

        if (norm <= Theta5)
        {
            return LowDegree(a, Pade5);
        }

        if (norm <= Theta7)
        {
            return LowDegree(a, Pade7);
        }

        if (norm <= Theta9)
        {
            return LowDegree(a, Pade9);
        }

        int squarings = Math.Max(0, (int)Math.Ceiling(Math.Log2(norm / Theta13)));
        var scaled = squarings == 0 ? a : a * Math.ScaleB(1.0, -squarings);
        var result = Degree13(scaled);
        for (int k = 0; k < squarings; k++)
        {
            result *= result;
        }

        return result;
    }

    private static Matrix<double> LowDegree(Matrix<double> a, double[] b)
    {
        int n = a.RowCount;
        var identity = Matrix<double>.Build.DenseIdentity(n);
        var a2 = a * a;
        var power = identity;
        var uSum = identity * b[1];
        var v = identity * b[0];
        for (int k = 2; k < b.Length; k += 2)
        {
            power *= a2;
            v += power * b[k];
            uSum += power * b[k + 1];
        }

        return Finish(a * uSum, v);
    }

    private static Matrix<double> Degree13(Matrix<double> a)
    {
        var b = Pade13;
        int n = a.RowCount;
        var identity = Matrix<double>.Build.DenseIdentity(n);
        var a2 = a * a;
        var a4 = a2 * a2;
        var a6 = a4 * a2;
        var uInner = a6 * (a6 * b[13] + a4 * b[11] + a2 * b[9]) + a6 * b[7] + a4 * b[5] + a2 * b[3] + identity * b[1];
        var v = a6 * (a6 * b[12] + a4 * b[10] + a2 * b[8]) + a6 * b[6] + a4 * b[4] + a2 * b[2] + identity * b[0];
        return Finish(a * uInner, v);
    }

    // r = (V - U)^{-1} (V + U), the [m/m] Padé approximant of e^A.
    private static Matrix<double> Finish(Matrix<double> u, Matrix<double> v) => (v - u).LU().Solve(v + u);
}
