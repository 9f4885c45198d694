using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Time;

namespace TermLocus.Core.Tests.Time;

public class StateSpaceTests
{
    public static TheoryData<double[], double[]> ProperFunctions() => new()
    {
        { [1.0], [2.0, 3.0, 1.0] },                            // 1/((s+1)(s+2))
        { [5.0, 1.0], [6.0, 11.0, 6.0, 1.0] },                 // (s+5)/((s+1)(s+2)(s+3))
        { [1.0, 2.0], [1.0, 1.0] },                            // (2s+1)/(s+1): feed-through
        { [4.0, 0.0, 3.0], [2.0, 5.0, 0.5] },                  // equal degrees, leading coefficient not 1
        { [1e6, 2e3], [1e6, 1e3 + 1e-3, 1e-6 * 1e3] },         // a stiff rig, coefficients 1e-6..1e6
        { [1.0], [0.0, 0.0, 1.0] },                            // 1/s²: integrators
    };

    [Theory]
    [MemberData(nameof(ProperFunctions))]
    public void Realisation_reproduces_the_transfer_function(double[] num, double[] den)
    {
        // C (sI - A)^-1 B + D = N(s)/D(s) (the definition of a realisation; evaluated with MathNet's LU).
        var h = new RationalFunction(Polynomial.FromAscending(num), Polynomial.FromAscending(den));
        var ss = StateSpace.FromTransferFunction(h);
        Assert.Equal(h.Denominator.Degree, ss.Order);
        foreach (var s in new[] { new Complex(0.3, 1.7), new Complex(-0.5, 0.2), new Complex(10.0, -40.0) })
        {
            var expected = h.Evaluate(s);
            var actual = ss.Evaluate(s);
            Assert.Equal(0.0, Complex.Abs(expected - actual), 1e-11 * Complex.Abs(expected));
        }
    }

    [Fact]
    public void Eigenvalues_of_the_state_matrix_are_the_poles()
    {
        // Poles -1e-3 and -1e3 with leading coefficient 1e-6 (common practice: eigenvalues of A are the poles).
        var den = Polynomial.FromDescending(1e-6, 1e-6 * (1e3 + 1e-3), 1e-6);
        var ss = StateSpace.FromTransferFunction(new RationalFunction(Polynomial.One, den));
        var eig = ss.A.Evd().EigenValues.Select(z => z.Real).Order().ToArray();
        Assert.Equal(-1e3, eig[0], 1e-9);
        // A backward-stable eigen-solver errs by about eps·‖A‖ ≈ 2e-13 on the small pole.
        Assert.Equal(-1e-3, eig[1], 1e-12);
    }

    [Fact]
    public void Balancing_shrinks_a_badly_scaled_companion_matrix()
    {
        // s³ + 1e4 s² + 1e8 s + 1e12: the plain companion matrix has 1-norm about 1e12; a diagonal similarity
        // (Parlett & Reinsch, Numer. Math. 13, 1969, from memory) evens rows and columns out to about 1e4.
        var den = Polynomial.FromDescending(1, 1e4, 1e8, 1e12);
        var ss = StateSpace.FromTransferFunction(new RationalFunction(Polynomial.One, den));
        Assert.True(ss.A.L1Norm() < 1e6, $"norm {ss.A.L1Norm()}");
    }

    [Fact]
    public void Static_gain_has_no_states()
    {
        var ss = StateSpace.FromTransferFunction(new RationalFunction(Polynomial.Constant(6.0), Polynomial.Constant(4.0)));
        Assert.Equal(0, ss.Order);
        Assert.Equal(1.5, ss.D, 1e-15);
    }

    [Fact]
    public void Improper_function_is_refused_with_a_reason()
    {
        var h = new RationalFunction(Polynomial.FromAscending(1, 1, 1), Polynomial.FromAscending(1, 1));
        Assert.False(StateSpace.TryFromTransferFunction(h, out var ss, out var error));
        Assert.Null(ss);
        Assert.Contains("improper", error, StringComparison.Ordinal);
        Assert.Throws<ArgumentException>(() => StateSpace.FromTransferFunction(h));
    }

    [Fact]
    public void Common_factors_are_kept_as_states()
    {
        // (s+1)/((s+1)(s+2)) keeps both states: a cancelled pole is still a pole of the loop.
        var h = new RationalFunction(Polynomial.FromAscending(1, 1), Polynomial.FromAscending(2, 3, 1));
        Assert.Equal(2, StateSpace.FromTransferFunction(h).Order);
    }
}
