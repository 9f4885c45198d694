using TermLocus.Core.Algebra;
using TermLocus.Core.Expressions;
using TermLocus.Core.Plants;
using static TermLocus.Core.Tests.Expressions.ExpressionTestText;

namespace TermLocus.Core.Tests.Expressions;

public class ExpressionParserTests
{
    private const double Tol = 1e-15;

    [Theory]
    [InlineData("12", 12.0)]
    [InlineData("0.5", 0.5)]
    [InlineData("4.7e-6", 4.7e-6)]
    [InlineData("4.7E-06", 4.7e-6)]
    [InlineData("1e+3", 1000.0)]
    [InlineData(".25", 0.25)]
    public void Number_literals_are_read_in_invariant_form(string text, double expected)
    {
        // Plant-file design: numbers 12, 0.5, 4.7e-6; the printer's round-trip form writes E+/E- exponents.
        Assert.Equal(expected, Scalar(text), Tol);
    }

    [Theory]
    [InlineData("1 + 2*3", 7.0)]
    [InlineData("(1 + 2)*3", 9.0)]
    [InlineData("2*3^2", 18.0)]
    [InlineData("-2^2", -4.0)]
    [InlineData("2^3^2", 512.0)]
    [InlineData("8/4/2", 1.0)]
    [InlineData("1 - 2 - 3", -4.0)]
    [InlineData("--3", 3.0)]
    [InlineData("2*-3", -6.0)]
    [InlineData("2^-1", 0.5)]
    [InlineData("-(1 + 1)", -2.0)]
    public void Operators_follow_the_usual_precedence_and_associativity(string text, double expected)
    {
        // Common practice: ^ binds tightest and groups to the right, unary minus applies to the power
        // (-2^2 = -4), * / and + - group to the left.
        Assert.Equal(expected, Scalar(text), Tol);
    }

    [Theory]
    [InlineData("pi", Math.PI)]
    [InlineData("2*pi", 2 * Math.PI)]
    [InlineData("sqrt(16)", 4.0)]
    [InlineData("exp(0)", 1.0)]
    [InlineData("ln(exp(2))", 2.0)]
    [InlineData("abs(-3)", 3.0)]
    [InlineData("2^(1/2)", 1.4142135623730951)]
    [InlineData("4^0.5", 2.0)]
    public void Constants_and_functions_give_their_textbook_values(string text, double expected)
    {
        // Common practice: sqrt(16) = 4, ln(e^2) = 2, sqrt(2) = 1.4142135623730951 (double nearest).
        Assert.Equal(expected, Scalar(text), 1e-15);
    }

    [Fact]
    public void Parameters_take_the_given_values()
    {
        Assert.Equal(2.0, Scalar("K^0.5", ("K", 4.0)), Tol);
        Assert.Equal(10.0, Scalar("K*tau_2 + K", ("K", 2.0), ("tau_2", 4.0)), Tol);
    }

    [Fact]
    public void The_variable_gives_polynomials_in_s()
    {
        // (s+1)^3 = s^3 + 3s^2 + 3s + 1 (binomial theorem, common practice).
        Assert.Equal(new[] { 1.0, 3.0, 3.0, 1.0 }, Coefficients(Eval("(s+1)^3").Numerator));
        Assert.Equal(new[] { 0.0, -1.0 }, Coefficients(Eval("-s").Numerator));
        Assert.Equal(new[] { 1.0 }, Coefficients(Eval("s^0").Numerator));
        Assert.Equal(new[] { 0.0, 0.0, 1.0 }, Coefficients(Eval("s^(2)").Numerator));
        Assert.Equal(new[] { 0.0, 0.0, 1.0 }, Coefficients(Eval("s^2.0").Numerator));
    }

    [Fact]
    public void A_quotient_keeps_numerator_and_denominator_apart_and_never_cancels()
    {
        // Plant-file design, Meaning: common factors are not cancelled.
        var f = Eval("(s+1)/(s+1)");
        Assert.Equal(new[] { 1.0, 1.0 }, Coefficients(f.Numerator));
        Assert.Equal(new[] { 1.0, 1.0 }, Coefficients(f.Denominator));

        var half = Eval("s/2");
        Assert.Equal(new[] { 0.0, 1.0 }, Coefficients(half.Numerator));
        Assert.Equal(new[] { 2.0 }, Coefficients(half.Denominator));
    }

    [Fact]
    public void A_sum_of_fractions_keeps_each_written_denominator()
    {
        // 1/(s+1) + 1/(s+1) = (2s+2)/(s+1)^2: each written fraction counts as its own dynamics.
        var f = Eval("1/(s+1) + 1/(s+1)");
        Assert.Equal(new[] { 2.0, 2.0 }, Coefficients(f.Numerator));
        Assert.Equal(new[] { 1.0, 2.0, 1.0 }, Coefficients(f.Denominator));
    }

    [Fact]
    public void A_PI_controller_becomes_one_fraction()
    {
        // Kp + Ki/s = (Kp s + Ki)/s (common practice).
        var f = Eval("Kp + Ki/s", ("Kp", 2.0), ("Ki", 5.0));
        Assert.Equal(new[] { 5.0, 2.0 }, Coefficients(f.Numerator));
        Assert.Equal(new[] { 0.0, 1.0 }, Coefficients(f.Denominator));
    }

    [Fact]
    public void Names_are_listed_with_every_use_and_its_offset()
    {
        var parsed = Parse("K*s + K + tau");
        Assert.Equal([new NameUse("K", 0), new NameUse("K", 6), new NameUse("tau", 10)], parsed.Names.ToArray());
        Assert.Equal(["K", "tau"], parsed.DistinctNames.ToArray());
        Assert.True(parsed.ContainsVariable);
        Assert.False(Parse("K*2").ContainsVariable);
    }

    [Fact]
    public void Whitespace_and_line_breaks_separate_tokens()
    {
        Assert.Equal(new[] { 0.0, 3.0 }, Coefficients(Eval("K *\n\t s", ("K", 3.0)).Numerator));
    }

    [Fact]
    public void A_z_domain_expression_uses_z_as_its_variable()
    {
        var f = ExpressionParser.Parse(ExpressionText.Inline("plant", "z - 0.5"), FileName, "z").Evaluate(new Dictionary<string, double>());
        Assert.Equal(new[] { -0.5, 1.0 }, Coefficients(f.Numerator));
        Assert.Throws<ArgumentException>(() => ExpressionParser.Parse(ExpressionText.Inline("plant", "x"), FileName, "x"));
    }

    [Fact]
    public void The_degree_bound_counts_without_cancellation()
    {
        Assert.Equal(3, Parse("1/(s*(s+1)*(s+2))").DegreeBound);
        Assert.Equal(2, Parse("1/(s+1) + 1/(s+2)").DegreeBound);
        Assert.Equal(200, Parse("s^200").DegreeBound);
    }

    [Fact]
    public void A_long_chain_of_terms_does_not_nest()
    {
        // A sum of 100000 terms is one flat node: no stack is consumed per term.
        string text = string.Join("+", Enumerable.Repeat("1", 100_000));
        Assert.Equal(100_000.0, Scalar(text), 0.0);
    }

    [Fact]
    public void Nesting_up_to_the_limit_is_accepted()
    {
        int depth = ExpressionLimits.MaxNestingDepth - 1;
        string text = new string('(', depth) + "s" + new string(')', depth);
        Assert.Equal(new[] { 0.0, 1.0 }, Coefficients(Eval(text).Numerator));
    }

    [Theory]
    [InlineData("Kc", true)]
    [InlineData("tau_2", true)]
    [InlineData("_x", true)]
    [InlineData("S", true)]
    [InlineData("s", false)]
    [InlineData("z", false)]
    [InlineData("pi", false)]
    [InlineData("sqrt", false)]
    [InlineData("ln", false)]
    [InlineData("2K", false)]
    [InlineData("K-1", false)]
    [InlineData("", false)]
    public void Parameter_names_follow_the_identifier_rule_and_avoid_reserved_words(string name, bool valid)
    {
        // Plant-file design: names [A-Za-z_][A-Za-z0-9_]*, s reserved.
        Assert.Equal(valid, ExpressionNames.IsValidParameterName(name));
    }

    [Fact]
    public void Printing_writes_the_expression_language()
    {
        var p = Polynomial.FromDescending(2, -3, 0, 1);
        Assert.Equal("2*s^3 - 3*s^2 + 1", ExpressionPrinter.Print(p));
        Assert.Equal("-s + 4.7E-06", ExpressionPrinter.Print(Polynomial.FromDescending(-1, 4.7e-6)));
        Assert.Equal("0", ExpressionPrinter.Print(Polynomial.Zero));
        Assert.Equal("(1) / (z - 0.5)", ExpressionPrinter.Print(new RationalFunction(Polynomial.One, Polynomial.FromDescending(1, -0.5)), "z"));
    }
}
