using System.Numerics;
using CsCheck;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Analysis;

public class RouthHurwitzTests
{
    [Fact]
    public void Closed_loop_with_two_right_half_plane_poles()
    {
        // s^3 + 10s^2 + 31s + 1030 (Nise, Control Systems Engineering, 6th ed., Example 6.1, from memory):
        // rows 1 31 / 10 1030 / -72 / 1030; two sign changes, two right-half-plane poles.
        var array = RouthHurwitz.Tabulate(Polynomial.FromDescending(1, 10, 31, 1030));
        Assert.Equal(new[] { 1.0, 10.0, -72.0, 1030.0 }, array.FirstColumn.ToArray(), new ToleranceComparer(1e-12));
        Assert.Equal(31.0, array.Rows[0][1]);
        Assert.Equal(2, array.RightHalfPlaneCount);
        Assert.Equal(1, array.LeftHalfPlaneCount);
        Assert.False(array.IsStable);
    }

    [Fact]
    public void Quartic_with_a_negative_first_column_entry()
    {
        // s^4 + 2s^3 + 3s^2 + 4s + 5 (Ogata, Modern Control Engineering, 5th ed., Routh's stability criterion
        // example, from memory): first column 1, 2, 1, -6, 5; two sign changes.
        var array = RouthHurwitz.Tabulate(Polynomial.FromDescending(1, 2, 3, 4, 5));
        Assert.Equal(new[] { 1.0, 2.0, 1.0, -6.0, 5.0 }, array.FirstColumn.ToArray(), new ToleranceComparer(1e-12));
        Assert.Equal(2, array.RightHalfPlaneCount);
    }

    [Fact]
    public void A_zero_only_in_the_first_column_is_handled_by_the_epsilon_method()
    {
        // s^5 + 2s^4 + 3s^3 + 6s^2 + 5s + 3 (Nise, 6th ed., Example 6.2, from memory): the s^3 row starts with 0,
        // replaced by ε; the first column reads 1, 2, ε, (6ε - 7)/ε, ..., 3: two sign changes, two RHP poles.
        var array = RouthHurwitz.Tabulate(Polynomial.FromDescending(1, 2, 3, 6, 5, 3));
        Assert.Equal(new[] { 2 }, array.EpsilonRows.ToArray());
        Assert.True(array.Rows[2][0] > 0 && array.Rows[2][0] < 1e-6);
        Assert.Equal(3.5, array.Rows[2][1], 1e-12);
        Assert.True(array.Rows[3][0] < 0);
        Assert.Equal(2, array.RightHalfPlaneCount);
        Assert.False(array.IsStable);
    }

    [Theory]
    [InlineData(new[] { 1.0, 0, 0, 0, 0, 2, 0, 2 }, 4)]
    [InlineData(new[] { 1.0, 0, 0, 0, -2, -2, -1, -3 }, 3)]
    public void Sparse_polynomials_needing_epsilon_in_two_rows_are_counted_by_the_limit(double[] descending, int expected)
    {
        // s^7 + 2s^2 + 2 and s^7 - 2s^3 - 2s^2 - s - 3: ε is needed in the s^6 and s^5 rows, and the sign of a later
        // entry is decided by an ε-order term that a numeric ε loses to rounding. Expected counts from the ε method
        // carried out exactly in SymPy 1.14 (rational arithmetic, limits ε → 0+), which agree with the roots.
        var p = Polynomial.FromDescending(descending);
        var array = RouthHurwitz.Tabulate(p);
        Assert.Equal(new[] { 1, 2 }, array.EpsilonRows.ToArray());
        Assert.Equal(expected, array.RightHalfPlaneCount);
        Assert.Equal(expected, PolynomialRoots.Find(p).Count(r => r.Real > 0));
    }

    [Fact]
    public void An_all_zero_row_uses_the_derivative_of_the_auxiliary_polynomial()
    {
        // s^5 + 7s^4 + 6s^3 + 42s^2 + 8s + 56 (Nise, 6th ed., Example 6.4, from memory): the s^3 row vanishes; the
        // auxiliary polynomial 7s^4 + 42s^2 + 56 = 7(s^2 + 2)(s^2 + 4) gives the row 28, 84; no sign changes, so
        // no RHP poles, four on the imaginary axis, one in the left half-plane.
        var array = RouthHurwitz.Tabulate(Polynomial.FromDescending(1, 7, 6, 42, 8, 56));
        Assert.Equal(new[] { 2 }, array.AuxiliaryRows.ToArray());
        Assert.Equal(28.0, array.Rows[2][0], 1e-12);
        Assert.Equal(84.0, array.Rows[2][1], 1e-12);
        Assert.Equal(21.0, array.Rows[3][0], 1e-12);
        Assert.Equal(0, array.RightHalfPlaneCount);
        Assert.Equal(4, array.ImaginaryAxisCount);
        Assert.Equal(1, array.LeftHalfPlaneCount);
        Assert.False(array.IsStable);
    }

    [Fact]
    public void Marginal_gain_of_a_third_order_loop_shows_two_imaginary_axis_roots()
    {
        // s^3 + 2s^2 + 4s + K at K = 8 = (s + 2)(s^2 + 4) (common practice): the s^1 row vanishes, the auxiliary
        // polynomial 2s^2 + 8 has roots ±2j. At K = 7 the loop is stable, at K = 9 two poles cross over.
        var marginal = RouthHurwitz.Tabulate(Polynomial.FromDescending(1, 2, 4, 8));
        Assert.Equal(0, marginal.RightHalfPlaneCount);
        Assert.Equal(2, marginal.ImaginaryAxisCount);
        Assert.True(RouthHurwitz.IsStable(Polynomial.FromDescending(1, 2, 4, 7)));
        Assert.Equal(2, RouthHurwitz.CountRightHalfPlaneRoots(Polynomial.FromDescending(1, 2, 4, 9)));
    }

    [Fact]
    public void Roots_at_the_origin_count_as_imaginary_axis_roots()
    {
        var array = RouthHurwitz.Tabulate(Polynomial.FromDescending(1, 3, 2, 0)); // s(s + 1)(s + 2)
        Assert.Equal(0, array.RightHalfPlaneCount);
        Assert.Equal(1, array.ImaginaryAxisCount);
        Assert.False(array.IsStable);
    }

    [Fact]
    public void Degrees_zero_one_and_two_follow_the_coefficient_sign_rule()
    {
        // Up to degree 2 a polynomial is stable exactly when all coefficients share one sign (common practice).
        Assert.True(RouthHurwitz.IsStable(Polynomial.Constant(-3)));
        Assert.True(RouthHurwitz.IsStable(Polynomial.FromAscending(2, 1)));
        Assert.False(RouthHurwitz.IsStable(Polynomial.FromAscending(-2, 1)));
        Assert.True(RouthHurwitz.IsStable(Polynomial.FromAscending(-5, -1, -2)));
        Assert.Equal(1, RouthHurwitz.CountRightHalfPlaneRoots(Polynomial.FromAscending(-5, 1, 2)));
        Assert.Throws<ArgumentException>(() => RouthHurwitz.Tabulate(Polynomial.Zero));
    }

    [Fact]
    public void Counts_agree_with_the_roots_on_random_polynomials()
    {
        // Cross-check against PolynomialRoots on dense polynomials (every |coefficient| in [0.05, 1], random signs);
        // polynomials with a root within 1e-6 (relative) of the imaginary axis are skipped, as the floating-point
        // array may legitimately call those either way. Sparse polynomials, where the ε method itself can miscount
        // (see RouthHurwitz remarks), are covered by the worked cases above.
        var coefficient = Gen.Select(Gen.Double[0.05, 1.0], Gen.Bool, (x, negative) => negative ? -x : x);
        Gen.Int[1, 10].SelectMany(n => coefficient.Array[n + 1]).Sample(c =>
        {
            var p = Polynomial.FromAscending(c);
            var roots = PolynomialRoots.Find(p);
            if (roots.Any(r => Math.Abs(r.Real) < 1e-6 * Math.Max(1.0, Complex.Abs(r))))
            {
                return;
            }

            var array = RouthHurwitz.Tabulate(p);
            Assert.Equal(roots.Count(r => r.Real > 0), array.RightHalfPlaneCount);
            Assert.Equal(roots.All(r => r.Real < 0), array.IsStable);
        }, iter: 500);
    }

    [Fact]
    public void Polynomials_built_from_left_half_plane_roots_are_stable()
    {
        Gen.Select(Gen.Double[-5.0, -0.01], Gen.Double[0.0, 5.0], Gen.Bool, (x, y, pair) => pair ? new[] { new Complex(x, y), new Complex(x, -y) } : new[] { new Complex(x, 0) })
            .Array[1, 5].Sample(groups =>
            {
                var p = Polynomial.FromRoots(groups.SelectMany(g => g));
                Assert.True(RouthHurwitz.IsStable(p));
            }, iter: 300);
    }

    private sealed class ToleranceComparer(double tolerance) : IEqualityComparer<double>
    {
        public bool Equals(double x, double y) => Math.Abs(x - y) <= tolerance * Math.Max(1.0, Math.Abs(x));

        public int GetHashCode(double obj) => 0;
    }
}
