using System.Numerics;
using MathNet.Numerics.LinearAlgebra;
using TermLocus.Core.Algebra;
using ComplexVector = MathNet.Numerics.LinearAlgebra.Vector<System.Numerics.Complex>;
using RealVector = MathNet.Numerics.LinearAlgebra.Vector<double>;

namespace TermLocus.Core.Time;

/// <summary>
/// The numerator C·adj(zI − Φ)·(z·Γ₀ + Γ₁) of a hold equivalent, found by interpolation: its values
/// det(zI − Φ)·C·(zI − Φ)⁻¹·(z·Γ₀ + Γ₁) on a circle of radius r (chosen by the caller to keep every point away from
/// the poles) are turned into coefficients by a discrete Fourier transform. Γ₁ = null is the plain hold (degree
/// below n); with Γ₁ the degree is at most n.
/// </summary>
internal static class HoldNumerator
{
    public static Polynomial Interpolate(
        RealVector c, Matrix<double> phi, RealVector gamma0, RealVector? gamma1, Polynomial den, double radius)
    {
        int points = gamma1 is null ? den.Degree : den.Degree + 1;
        var values = new Complex[points];
        for (int j = 0; j < points; j++)
        {
            var z = Complex.FromPolarCoordinates(radius, 2.0 * Math.PI * j / points);
            var input = ComplexVector.Build.Dense(gamma0.Count, i => (gamma1 is null ? 1.0 : z) * gamma0[i] + (gamma1?[i] ?? 0.0));
            values[j] = den.Evaluate(z) * Transfer(c, phi, input, z);
        }

        // P(z_j) = Σ_k p_k r^k ω^{jk}, ω = e^{2πi/m}: the inverse transform gives p_k r^k.
        var coefficients = new double[points];
        for (int k = 0; k < points; k++)
        {
            var sum = Complex.Zero;
            for (int j = 0; j < points; j++)
            {
                sum += values[j] * Complex.FromPolarCoordinates(1.0, -2.0 * Math.PI * j * k / points);
            }

            coefficients[k] = sum.Real / points / Math.Pow(radius, k);
        }

        return Polynomial.FromAscending(coefficients);
    }

    // C·(zI − Φ)⁻¹·input at one complex point.
    private static Complex Transfer(RealVector c, Matrix<double> phi, ComplexVector input, Complex z)
    {
        int n = c.Count;
        var m = Matrix<Complex>.Build.Dense(n, n, (i, j) => (i == j ? z : Complex.Zero) - phi[i, j]);
        var x = m.LU().Solve(input);
        var sum = Complex.Zero;
        for (int i = 0; i < n; i++)
        {
            sum += c[i] * x[i];
        }

        return sum;
    }
}
