using System.Diagnostics.CodeAnalysis;
using MathNet.Numerics.LinearAlgebra;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Time;

/// <summary>
/// A single-input single-output state-space realisation x' = A·x + B·u, y = C·x + D·u (continuous time) or
/// x[k+1] = A·x[k] + B·u[k], y[k] = C·x[k] + D·u[k] (discrete time; the same algebra). Built from a proper
/// transfer function in controllable canonical form, then balanced by a diagonal similarity with powers of two
/// (exact in floating point) so that rigs whose coefficients span 1e-6..1e6 keep a small, even matrix norm.
/// </summary>
/// <param name="A">The n×n state matrix (n = <see cref="Order"/>, may be 0).</param>
/// <param name="B">The input vector, length n.</param>
/// <param name="C">The output vector, length n.</param>
/// <param name="D">The direct feed-through from input to output.</param>
public sealed record StateSpace(Matrix<double> A, Vector<double> B, Vector<double> C, double D)
{
    private const int MaxBalancingSweeps = 64;

    /// <summary>The number of states (the degree of the transfer function's denominator).</summary>
    public int Order => A.RowCount;

    /// <summary>
    /// A realisation of the proper rational function <paramref name="h"/> (deg N &lt;= deg D). Common factors are
    /// kept, so the order equals the denominator's degree. Throws <see cref="ArgumentException"/> when
    /// <paramref name="h"/> is improper or has a non-finite coefficient.
    /// </summary>
    public static StateSpace FromTransferFunction(RationalFunction h) =>
        TryFromTransferFunction(h, out var realisation, out var error)
            ? realisation
            : throw new ArgumentException(error, nameof(h));

    /// <summary>
    /// As <see cref="FromTransferFunction"/>, returning false with a one-line reason in <paramref name="error"/>
    /// instead of throwing.
    /// </summary>
    public static bool TryFromTransferFunction(
        RationalFunction h,
        [NotNullWhen(true)] out StateSpace? realisation,
        [NotNullWhen(false)] out string? error)
    {
        ArgumentNullException.ThrowIfNull(h);
        realisation = null;
        var num = h.Numerator;
        var den = h.Denominator;
        if (num.Degree > den.Degree)
        {
            error = $"Transfer function is improper (numerator degree {num.Degree} above denominator degree " +
                    $"{den.Degree}); it has no state-space realisation.";
            return false;
        }

        if (num.Coefficients.Any(c => !double.IsFinite(c)) || den.Coefficients.Any(c => !double.IsFinite(c)))
        {
            error = "Transfer function has a NaN or infinite coefficient.";
            return false;
        }

        realisation = Balance(ControllableCanonical(num, den));
        error = null;
        return true;
    }

    /// <summary>The value C·(sI − A)⁻¹·B + D of the realisation at complex point <paramref name="s"/>.</summary>
    public System.Numerics.Complex Evaluate(System.Numerics.Complex s)
    {
        int n = Order;
        if (n == 0)
        {
            return D;
        }

        var m = Matrix<System.Numerics.Complex>.Build.Dense(n, n, (i, j) => (i == j ? s : 0) - A[i, j]);
        var b = Vector<System.Numerics.Complex>.Build.Dense(n, i => B[i]);
        var x = m.LU().Solve(b);
        var y = new System.Numerics.Complex(D, 0);
        for (int i = 0; i < n; i++)
        {
            y += C[i] * x[i];
        }

        return y;
    }

    // Companion form: states x1..xn with x_i' = x_{i+1}, x_n' = -Σ a_i x_{i+1} + u, where the denominator is
    // normalised to be monic; a proper numerator leaves D = b_n and the remainder b - D·a on C.
    private static StateSpace ControllableCanonical(Polynomial num, Polynomial den)
    {
        int n = den.Degree;
        double lead = den.Leading;
        double d = num.Degree == n ? num[n] / lead : 0.0;
        var a = Matrix<double>.Build.Dense(n, n);
        var b = Vector<double>.Build.Dense(n);
        var c = Vector<double>.Build.Dense(n);
        for (int i = 0; i < n; i++)
        {
            if (i + 1 < n)
            {
                a[i, i + 1] = 1.0;
            }

            a[n - 1, i] = -den[i] / lead;
            c[i] = (num[i] / lead) - (d * den[i] / lead);
        }

        if (n > 0)
        {
            b[n - 1] = 1.0;
        }

        return new StateSpace(a, b, c, d);
    }

    // Parlett–Reinsch balancing (radix 2): Ã = S⁻¹AS with S diagonal, then B̃ = S⁻¹B, C̃ = CS. The transfer
    // function is unchanged and powers of two introduce no rounding.
    private static StateSpace Balance(StateSpace ss)
    {
        int n = ss.Order;
        var a = ss.A.Clone();
        var scale = Enumerable.Repeat(1.0, n).ToArray();
        bool done = false;
        for (int sweep = 0; sweep < MaxBalancingSweeps && !done; sweep++)
        {
            done = true;
            for (int i = 0; i < n; i++)
            {
                done &= !BalanceOne(a, scale, i);
            }
        }

        var b = Vector<double>.Build.Dense(n, i => ss.B[i] / scale[i]);
        var c = Vector<double>.Build.Dense(n, i => ss.C[i] * scale[i]);
        return new StateSpace(a, b, c, ss.D);
    }

    private static bool BalanceOne(Matrix<double> a, double[] scale, int i)
    {
        int n = a.RowCount;
        double col = 0.0, row = 0.0;
        for (int j = 0; j < n; j++)
        {
            if (j != i)
            {
                col += Math.Abs(a[j, i]);
                row += Math.Abs(a[i, j]);
            }
        }

        if (col == 0.0 || row == 0.0)
        {
            return false;
        }

        double sum = col + row, f = 1.0;
        while (col < row / 2.0)
        {
            f *= 2.0;
            col *= 4.0;
        }

        while (col > row * 2.0)
        {
            f /= 2.0;
            col /= 4.0;
        }

        if ((col + row) / f >= 0.95 * sum)
        {
            return false;
        }

        scale[i] *= f;
        for (int j = 0; j < n; j++)
        {
            a[i, j] /= f;
            a[j, i] *= f;
        }

        return true;
    }
}
