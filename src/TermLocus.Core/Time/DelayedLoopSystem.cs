using MathNet.Numerics.LinearAlgebra;

namespace TermLocus.Core.Time;

/// <summary>
/// A feedback loop with a transport delay T inside it, as one delay system. Signals: e = r ∓ w (minus for
/// negative feedback), x = F·e, y(t) = x(t − T) the output, w = H·y. With F = (A₁, B₁, C₁, d₁), H = (A₂, B₂, C₂, d₂)
/// and the reference held in an extra state ρ (ρ = 1 from t = 0 on, ρ' = 0), the state η = (ξ₁, ξ₂, ρ) obeys
/// η' = Ã·η + b·y, x = c·η + d·y, where y(t) = x(t − T). Unrolling x(t − T) gives η' = Ã·η + Σᵢ dⁱ⁻¹·b·c·η(t − iT).
/// </summary>
/// <param name="A">Ã, (n₁ + n₂ + 1) square.</param>
/// <param name="DelayedCoupling">N₁ = b·c, the coupling to the state one delay back.</param>
/// <param name="Output">c, the row giving x from η.</param>
/// <param name="Feedthrough">d = ∓d₁·d₂, the part of x(t) made of x(t − T) directly (0 unless F and H both
/// have a direct feed-through).</param>
internal sealed record DelayedLoopSystem(Matrix<double> A, Matrix<double> DelayedCoupling, Vector<double> Output, double Feedthrough)
{
    /// <summary>The loop of forward path F, feedback path H and feedback sign (−1 negative, +1 positive).</summary>
    public static DelayedLoopSystem Of(StateSpace f, StateSpace h, double sign)
    {
        int n1 = f.Order, n2 = h.Order, n = n1 + n2 + 1, rho = n - 1;
        var a = Matrix<double>.Build.Dense(n, n);
        var b = Vector<double>.Build.Dense(n);
        var c = Vector<double>.Build.Dense(n);
        a.SetSubMatrix(0, 0, f.A);
        a.SetSubMatrix(n1, n1, h.A);
        for (int i = 0; i < n1; i++)
        {
            a[i, rho] = f.B[i];
            for (int j = 0; j < n2; j++)
            {
                a[i, n1 + j] = sign * f.B[i] * h.C[j];
            }

            b[i] = sign * f.B[i] * h.D;
            c[i] = f.C[i];
        }

        for (int j = 0; j < n2; j++)
        {
            b[n1 + j] = h.B[j];
            c[n1 + j] = sign * f.D * h.C[j];
        }

        c[rho] = f.D;
        return new DelayedLoopSystem(a, b.OuterProduct(c), c, sign * f.D * h.D);
    }

    /// <summary>The number of states, the reference's included.</summary>
    public int Order => A.RowCount;
}
