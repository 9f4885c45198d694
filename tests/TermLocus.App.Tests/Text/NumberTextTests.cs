using TermLocus.App.Text;

namespace TermLocus.App.Tests.Text;

public class NumberTextTests
{
    [Theory]
    [InlineData(3.1, "3.100")]
    [InlineData(12.4, "12.40")]
    [InlineData(0.22360679, "0.2236")]
    [InlineData(4982.3, "4982")]
    [InlineData(99999.4, "99999")]
    [InlineData(123456.0, "1.235e+05")]
    [InlineData(0.0000047, "4.700e-06")]
    [InlineData(9.99996, "10.00")]
    [InlineData(-0.00001, "-1.000e-05")]
    [InlineData(-0.00004, "-4.000e-05")]
    [InlineData(0.0, "0")]
    [InlineData(double.NaN, "nan")]
    [InlineData(double.NegativeInfinity, "-inf")]
    public void Significant_uses_fixed_invariant_formats(double value, string expected) =>
        Assert.Equal(expected, NumberText.Significant(value));

    [Theory]
    [InlineData(0.35, "0.35")]
    [InlineData(5.2, "5.2")]
    [InlineData(20.0, "20")]
    [InlineData(-0.0, "0")]
    [InlineData(1.00954e-9, "1.00954e-09")] // lower-case exponent, as Significant spells it
    [InlineData(2.5e20, "2.5e+20")]
    public void Exact_reads_back_as_the_same_double(double value, string expected) =>
        Assert.Equal(expected, NumberText.Exact(value));

    [Theory]
    [InlineData(12.000000001, "12")]
    [InlineData(2.41421356237, "2.414214")]
    [InlineData(0.000123456789, "0.0001234568")]
    [InlineData(1.0095412345e-9, "1.009541e-09")]
    public void Short_rounds_away_solver_noise(double value, string expected) =>
        Assert.Equal(expected, NumberText.Short(value));

    [Theory]
    [InlineData("1.25", 1.25)]
    [InlineData(" 4.7e-3 ", 0.0047)]
    [InlineData("-2", -2.0)]
    public void TryParse_accepts_invariant_numbers(string text, double expected)
    {
        Assert.True(NumberText.TryParse(text, out double value));
        Assert.Equal(expected, value, 1e-15);
    }

    [Theory]
    [InlineData("1,5")]
    [InlineData("abc")]
    [InlineData("")]
    [InlineData("1e999")]
    [InlineData("NaN")]
    public void TryParse_refuses_anything_else(string text) => Assert.False(NumberText.TryParse(text, out _));
}
