using MathNet.Numerics.LinearAlgebra;

namespace TermLocus.Core.Time;

/// <summary>
/// The exact step-invariant (zero-order-hold) discretisation of x' = A·x + B·u over an interval h with u held
/// constant: x(t+h) = Φ·x(t) + Γ·u, Φ = e^{Ah}, Γ = ∫₀ʰ e^{Aτ} dτ · B. Both come from one exponential of the
/// augmented matrix [[A, B], [0, 0]]·h (C. Van Loan, "Computing integrals involving the matrix exponential",
/// IEEE TAC 23(3), 1978), which needs no inverse of A and so handles integrators.
/// </summary>
/// <param name="Phi">Φ = e^{Ah}, n×n.</param>
/// <param name="Gamma">Γ, length n.</param>
internal sealed record HoldDiscretisation(Matrix<double> Phi, Vector<double> Gamma)
{
    /// <summary>Φ and Γ of <paramref name="system"/> over <paramref name="intervalSeconds"/> (&gt;= 0).</summary>
    public static HoldDiscretisation Of(StateSpace system, double intervalSeconds)
    {
        int n = system.Order;
        var augmented = Matrix<double>.Build.Dense(n + 1, n + 1);
        for (int i = 0; i < n; i++)
        {
            for (int j = 0; j < n; j++)
            {
                augmented[i, j] = system.A[i, j] * intervalSeconds;
            }

            augmented[i, n] = system.B[i] * intervalSeconds;
        }

        var e = MatrixExponential.Compute(augmented);
        return new HoldDiscretisation(e.SubMatrix(0, n, 0, n), e.Column(n, 0, n));
    }
}
