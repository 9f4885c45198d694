using MathNet.Numerics.LinearAlgebra;
using TermLocus.Core.Time;

namespace TermLocus.Core.Tests.Time;

public class MatrixExponentialTests
{
    private const double Tight = 1e-13;

    [Fact]
    public void Diagonal_matrix_exponentiates_entry_by_entry()
    {
        // e^diag(d) = diag(e^d) (common practice: power series of a diagonal matrix).
        var e = MatrixExponential.Compute(Matrix<double>.Build.DenseOfDiagonalArray([-2.0, 0.5, 3.0]));
        Assert.Equal(Math.Exp(-2.0), e[0, 0], Math.Exp(-2.0) * Tight);
        Assert.Equal(Math.Exp(0.5), e[1, 1], Math.Exp(0.5) * Tight);
        Assert.Equal(Math.Exp(3.0), e[2, 2], Math.Exp(3.0) * Tight);
        Assert.Equal(0.0, e[0, 1], Tight);
        Assert.Equal(0.0, e[2, 0], Tight);
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(40.0)]
    public void Nilpotent_matrix_gives_the_finite_series(double a)
    {
        // N^3 = 0 so e^N = I + N + N²/2 exactly (common practice).
        var n = Matrix<double>.Build.DenseOfArray(new[,] { { 0, a, 0 }, { 0, 0, a }, { 0, 0, 0 } });
        var e = MatrixExponential.Compute(n);
        var expected = Matrix<double>.Build.DenseIdentity(3) + n + (n * n / 2.0);
        AssertClose(expected, e, 1e-13 * (1 + (a * a)));
    }

    [Theory]
    [InlineData(0.01)] // degree 3 approximant
    [InlineData(0.2)] // degree 5
    [InlineData(0.9)] // degree 7
    [InlineData(2.0)] // degree 9
    [InlineData(5.0)] // degree 13, no squaring
    [InlineData(50.0)] // degree 13 with squarings
    public void Rotation_generator_gives_cosine_and_sine(double w)
    {
        // exp([[0, w], [-w, 0]]) = [[cos w, sin w], [-sin w, cos w]] (common practice: harmonic oscillator).
        var e = MatrixExponential.Compute(Matrix<double>.Build.DenseOfArray(new[,] { { 0, w }, { -w, 0 } }));
        var expected = Matrix<double>.Build.DenseOfArray(new[,] { { Math.Cos(w), Math.Sin(w) }, { -Math.Sin(w), Math.Cos(w) } });
        AssertClose(expected, e, 1e-14 * Math.Max(1.0, w));
    }

    [Fact]
    public void Repeated_eigenvalue_with_one_eigenvector_gives_the_secular_term()
    {
        // A = [[-3, 1], [-1, -1]] has the double eigenvalue -2 and A + 2I nilpotent, so
        // e^{At} = e^{-2t} (I + (A + 2I) t) (common practice: Jordan block exponential).
        var a = Matrix<double>.Build.DenseOfArray(new[,] { { -3.0, 1.0 }, { -1.0, -1.0 } });
        foreach (double t in new[] { 0.3, 1.0, 4.0 })
        {
            var nilpotent = a + (2.0 * Matrix<double>.Build.DenseIdentity(2));
            var expected = Math.Exp(-2.0 * t) * (Matrix<double>.Build.DenseIdentity(2) + (nilpotent * t));
            AssertClose(expected, MatrixExponential.Compute(a * t), 1e-14);
        }
    }

    [Fact]
    public void Symmetric_matrices_match_the_eigen_decomposition_of_mathnet()
    {
        // e^A = V e^Λ Vᵀ for symmetric A, using MathNet's symmetric eigen-solver as the reference.
        var random = new Random(7);
        for (int trial = 0; trial < 20; trial++)
        {
            int n = 2 + (trial % 6);
            double spread = 0.05 * Math.Pow(2.0, trial % 10);
            var m = Matrix<double>.Build.Dense(n, n, (_, _) => spread * ((2.0 * random.NextDouble()) - 1.0));
            var a = m + m.Transpose();
            var evd = a.Evd(Symmetricity.Symmetric);
            var lambda = Matrix<double>.Build.DenseOfDiagonalVector(evd.EigenValues.Map(z => Math.Exp(z.Real)));
            var expected = evd.EigenVectors * lambda * evd.EigenVectors.Transpose();
            AssertClose(expected, MatrixExponential.Compute(a), 1e-12 * expected.L1Norm());
        }
    }

    [Fact]
    public void Non_square_or_non_finite_input_is_rejected()
    {
        Assert.Throws<ArgumentException>(() => MatrixExponential.Compute(Matrix<double>.Build.Dense(2, 3)));
        var bad = Matrix<double>.Build.Dense(2, 2);
        bad[1, 0] = double.NaN;
        Assert.Throws<ArgumentException>(() => MatrixExponential.Compute(bad));
    }

    private static void AssertClose(Matrix<double> expected, Matrix<double> actual, double tolerance)
    {
        Assert.Equal(expected.RowCount, actual.RowCount);
        for (int i = 0; i < expected.RowCount; i++)
        {
            for (int j = 0; j < expected.ColumnCount; j++)
            {
                Assert.Equal(expected[i, j], actual[i, j], tolerance);
            }
        }
    }
}
