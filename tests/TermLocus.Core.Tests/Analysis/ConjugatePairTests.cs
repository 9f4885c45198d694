using System.Numerics;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Analysis;

public class ConjugatePairTests
{
    // Common practice: real polynomials have their complex roots in conjugate pairs, and a report lists one of each.
    [Theory]
    [InlineData(-2.0, 3.0, -2.0, 3.0, true)]
    [InlineData(-2.0, 3.0, -2.0, -3.0, true)]
    [InlineData(-2.0, 3.0, -2.0, 3.0000001, false)]
    [InlineData(-2.0, 3.0, -2.0, 3.0 + 1e-10, true)]
    [InlineData(-2.0, 3.0, 2.0, 3.0, false)]
    [InlineData(0.0, 0.0, 0.0, 0.0, true)]
    [InlineData(1e-22, 0.0, 0.0, 0.0, true)]
    [InlineData(1e-13, 0.0, 0.0, 0.0, false)]
    public void Matches_a_pole_or_its_conjugate_to_a_relative_tolerance(double ar, double ai, double br, double bi, bool same)
    {
        Assert.Equal(same, ConjugatePair.Matches(new Complex(ar, ai), new Complex(br, bi)));
    }

    [Fact]
    public void A_pole_that_is_not_finite_matches_nothing()
    {
        Assert.False(ConjugatePair.Matches(new Complex(double.NaN, 0), new Complex(double.NaN, 0)));
        Assert.False(ConjugatePair.Matches(new Complex(double.PositiveInfinity, 0), new Complex(1, 0)));
    }
}
