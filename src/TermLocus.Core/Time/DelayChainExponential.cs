using MathNet.Numerics.LinearAlgebra;

namespace TermLocus.Core.Time;

/// <summary>
/// The exact one-step propagator of a linear system with one delay, η'(t) = Ã·η(t) + Σ_{i≥1} Nᵢ·η(t − iT),
/// Nᵢ = d^{i−1}·N₁, over a step h that divides T: η(t + h) = Σ_{i≥0} Eᵢ·η(t − iT). Stacking the past segments
/// (η(t), η(t − T), η(t − 2T), ...) turns the delay system into an ordinary one whose matrix is block upper
/// triangular Toeplitz (diagonal Ã, i-th block super-diagonal Nᵢ); its exponential is block Toeplitz too, and
/// its first block row is E₀, E₁, .... Block (0, i) of any power involves only blocks 0..i, so truncating the stack
/// after block I changes none of E₀..E_I. Computed by scaling and squaring with a degree-16 Taylor polynomial
/// (the scaled matrix has a 1-norm bound of at most 1/2, leaving a truncation error below 2e-20 relative), all in
/// block Toeplitz arithmetic: a product costs about I²/2 block products instead of (I n)³.
/// </summary>
internal static class DelayChainExponential
{
    private const int TaylorDegree = 16;
    private const double ScaledNormBound = 0.5;

    /// <summary>E₀..E_I for <paramref name="blocks"/> = I + 1 blocks of size n×n.</summary>
    public static Matrix<double>[] Compute(Matrix<double> a, Matrix<double> n1, double d, double h, int blocks)
    {
        var x = new Matrix<double>?[blocks];
        x[0] = a * h;
        double power = 1.0;
        for (int i = 1; i < blocks; i++)
        {
            x[i] = power == 0.0 ? null : n1 * (h * power);
            power *= d;
        }

        double norm = x.Sum(m => m?.L1Norm() ?? 0.0);
        int squarings = norm <= ScaledNormBound ? 0 : (int)Math.Ceiling(Math.Log2(norm / ScaledNormBound));
        double scale = Math.ScaleB(1.0, -squarings);
        for (int i = 0; i < blocks; i++)
        {
            x[i] = x[i] is null ? null : x[i]! * scale;
        }

        // Horner: e^X ≈ I + X(I + X/2(I + X/3(... (I + X/q)))).
        var r = Identity(a.RowCount, blocks);
        for (int j = TaylorDegree; j >= 1; j--)
        {
            r = Multiply(x, r);
            for (int i = 0; i < blocks; i++)
            {
                r[i] = r[i] is null ? null : r[i]! / j;
            }

            r[0] = (r[0] ?? Matrix<double>.Build.Dense(a.RowCount, a.RowCount)) + Matrix<double>.Build.DenseIdentity(a.RowCount);
        }

        for (int k = 0; k < squarings; k++)
        {
            r = Multiply(r, r);
        }

        return r.Select(m => m ?? Matrix<double>.Build.Dense(a.RowCount, a.RowCount)).ToArray();
    }

    private static Matrix<double>?[] Identity(int n, int blocks)
    {
        var r = new Matrix<double>?[blocks];
        r[0] = Matrix<double>.Build.DenseIdentity(n);
        return r;
    }

    // The first block row of the product of two block upper triangular Toeplitz matrices: a truncated convolution.
    private static Matrix<double>?[] Multiply(Matrix<double>?[] a, Matrix<double>?[] b)
    {
        var c = new Matrix<double>?[a.Length];
        for (int i = 0; i < a.Length; i++)
        {
            for (int j = 0; j <= i; j++)
            {
                if (a[j] is { } left && b[i - j] is { } right)
                {
                    c[i] = c[i] is null ? left * right : c[i]! + (left * right);
                }
            }
        }

        return c;
    }
}
