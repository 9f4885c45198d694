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

    // A figure printed beside its limit never reads equal to it or on the wrong side of it (common practice: a
    // report must not say "0.12 > 0.12"). Expected texts are the values rounded by hand.
    [Theory]
    [InlineData(0.12000001234, 0.12, "0.12000001")] // t½ just past a 0.12 s limit: "0.1200" would read 0.12
    [InlineData(0.0499985557597, 0.05, "0.049999")] // ζ just under 0.05: "0.05000" would read 0.05
    [InlineData(0.4213, 0.6, "0.4213")] // far from the limit: four digits as usual
    [InlineData(0.119996, 0.12, "0.119996")] // rounds up onto the limit at 4 and 5 digits
    public void Against_adds_digits_until_the_figure_reads_apart_from_its_limit(double value, double limit, string expected)
    {
        string text = NumberText.Against(value, limit);
        Assert.Equal(expected, text);
        Assert.Equal(Math.Sign(value - limit), Math.Sign(double.Parse(text, System.Globalization.CultureInfo.InvariantCulture) - limit));
    }

    // Swept values stood on by the workbench: seven significant digits (rounded by hand), more only when a tenth of
    // the step is finer than that.
    [Theory]
    [InlineData(66.59291075209914, 2.0, 66.59291)]
    [InlineData(22.891524873, 0.1, 22.89152)]
    [InlineData(1000.00012345, 1e-6, 1000.0001235)]
    [InlineData(4.000000000000001, 0.2, 4.0)]
    public void Tidy_keeps_seven_digits_unless_the_step_needs_more(double value, double step, double expected)
    {
        double tidy = NumberText.Tidy(value, step);
        Assert.Equal(expected, tidy, 0.0); // exact: the shortest text of the result is the text shown and saved
        Assert.InRange(Math.Abs(tidy - value), 0.0, step / 10);
    }
}
