using System.Collections.Immutable;
using TermLocus.Core.Expressions;
using TermLocus.Core.Plants;
using static TermLocus.Core.Tests.Expressions.ExpressionTestText;

namespace TermLocus.Core.Tests.Expressions;

public class ExpressionParserErrorTests
{
    [Theory]
    [InlineData("2s", 2, "write 2*s")]
    [InlineData("K s", 3, "write K*s")]
    [InlineData("2(s+1)", 2, "write 2*(...)")]
    [InlineData("(s+1)(s+2)", 6, "write (s+1)*(...)")]
    [InlineData("2 3", 3, "write 2*3")]
    [InlineData("-2s", 3, "write -2*s")]
    [InlineData("2e", 2, "write 2*e")]
    [InlineData("pi(2)", 3, "write pi*(...)")]
    public void Implicit_multiplication_is_refused_with_the_product_spelled_out(string text, int column, string fragment)
    {
        // Plant-file design: no implicit multiplication; 2s is an error that says so.
        var e = ParseError(text);
        Assert.Contains("missing '*'", e.Message, StringComparison.Ordinal);
        Assert.Contains(fragment, e.Message, StringComparison.Ordinal);
        Assert.Equal(new SourcePosition(1, column), e.Position);
    }

    [Theory]
    [InlineData("s^-1", 3, "negative power")]
    [InlineData("s^0.5", 3, "whole number from 0 to 200, not 0.5")]
    [InlineData("s^(K)", 3, "'(K)', which is not a written number")]
    [InlineData("(s+1)^(1+1)", 7, "not a written number")]
    [InlineData("s^201", 3, "degree too high")]
    [InlineData("s^100000", 3, "degree too high")]
    [InlineData("(s^2+1)^101", 9, "degree too high")]
    [InlineData("(s+1)^150*(s+1)^60", 10, "degree too high")]
    [InlineData("1/(s+1)^150 + 1/(s+2)^60", 13, "degree too high")]
    [InlineData("2^s", 3, "exponent must be free of s")]
    public void Powers_of_s_must_be_written_whole_numbers_within_the_degree_cap(string text, int column, string fragment)
    {
        // Plant-file design: ^ takes a non-negative integer exponent where s is inside.
        var e = ParseError(text);
        Assert.Contains(fragment, e.Message, StringComparison.Ordinal);
        Assert.Equal(new SourcePosition(1, column), e.Position);
    }

    [Theory]
    [InlineData("", 1, "empty expression")]
    [InlineData("   ", 1, "empty expression")]
    [InlineData("2+", 3, "ends too early")]
    [InlineData("(s+1", 5, "expected ')' to close the '(' at line 1, column 1")]
    [InlineData("s+1)", 4, "unmatched ')'")]
    [InlineData("2*()", 4, "found ')'")]
    [InlineData("2**3", 2, "'**' is not an operator: write ^")]
    [InlineData("+3", 1, "no unary plus")]
    [InlineData("1.", 3, "expected a digit after the decimal point")]
    [InlineData("1e309", 1, "too large")]
    [InlineData("2 \u00D7 s", 3, "U+00D7")]
    [InlineData("2 # s", 3, "unexpected character '#'")]
    [InlineData("2,5", 2, "decimal point")]
    [InlineData("sqrt 2", 1, "'sqrt' is a function: write sqrt(...)")]
    [InlineData("sqrt(s+1)", 6, "sqrt needs an argument free of s")]
    [InlineData("exp(2*s)", 5, "exp needs an argument free of s")]
    [InlineData("z + 1", 1, "'z' cannot be used here: the variable of this expression is s")]
    public void Syntax_errors_name_the_column_and_what_was_expected(string text, int column, string fragment)
    {
        var e = ParseError(text);
        Assert.Contains(fragment, e.Message, StringComparison.Ordinal);
        Assert.Equal(new SourcePosition(1, column), e.Position);
    }

    [Fact]
    public void In_a_z_domain_expression_s_is_not_available()
    {
        var e = ParseError("s + 1", "z");
        Assert.Contains("the variable of this expression is z", e.Message, StringComparison.Ordinal);
        Assert.Equal(new SourcePosition(1, 1), e.Position);
    }

    [Fact]
    public void Nesting_beyond_the_limit_is_refused_instead_of_overflowing_the_stack()
    {
        foreach (string text in new[]
        {
            new string('(', 100_000) + "1" + new string(')', 100_000),
            new string('-', 100_000) + "1",
            string.Join("^", Enumerable.Repeat("2", 100_000)),
            string.Concat(Enumerable.Repeat("sqrt(", 50_000)) + "1" + new string(')', 50_000),
        })
        {
            var e = ParseError(text);
            Assert.Contains("nested too deeply", e.Message, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Nested_functions_within_the_limit_on_a_small_stack_never_overflow_it()
    {
        // 199 nested calls are inside the depth limit, but at seven frames a level they can need more stack than a
        // 256 KB thread has (unoptimised tier-0 frames did; optimised ones may fit). Either outcome is fine, parsed
        // or refused with a located message (when it fits, the refusal is that sqrt takes no s); overflowing the
        // stack, which ends the whole process, is not.
        string text = string.Concat(Enumerable.Repeat("sqrt(", 199)) + "s" + new string(')', 199);
        string? outcome = null;
        Exception? failure = null;
        var thread = new Thread(
            () =>
            {
                try
                {
                    _ = Parse(text, "s");
                    outcome = "parsed";
                }
                catch (PlantFileException e)
                {
                    outcome = e.Error.ToString();
                }
                catch (Exception e)
                {
                    failure = e; // must reach the test, not end the process
                }
            },
            256 * 1024);
        thread.Start();
        thread.Join();

        Assert.Null(failure);
        Assert.NotNull(outcome);
        Assert.True(outcome == "parsed" || outcome.Contains(": error: ", StringComparison.Ordinal), outcome);
    }

    [Fact]
    public void The_error_prints_as_file_line_column()
    {
        var e = ParseError("2s");
        Assert.StartsWith("bench.toml:1:2: error: missing '*'", e.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Positions_come_from_the_expression_text_map_across_lines()
    {
        // A TOML multi-line string starting on line 7, column 14: "K *\n  2s" (second line indented by two).
        string text = "K *\n  2s";
        var positions = new List<SourcePosition>();
        for (int i = 0; i <= 3; i++)
        {
            positions.Add(new SourcePosition(7, 14 + i));
        }

        for (int i = 0; i < text.Length - 3; i++)
        {
            positions.Add(new SourcePosition(8, 1 + i));
        }

        var source = new ExpressionText("plant", text, [.. positions]);
        var e = Assert.Throws<PlantFileException>(() => ExpressionParser.Parse(source, "lathe.toml")).Error;
        Assert.Equal(new SourcePosition(8, 4), e.Position);
        Assert.Equal("lathe.toml", e.File);
    }

    [Theory]
    [InlineData("1/0", 3, "division by zero: '0' is 0")]
    [InlineData("K/(K-1)", 3, "division by zero: '(K-1)' is 0")]
    [InlineData("s/(0*s)", 3, "division by zero")]
    [InlineData("0^-1", 1, "division by zero")]
    [InlineData("ln(-1)", 1, "'ln(-1)' is not a real number")]
    [InlineData("sqrt(K-2)", 1, "is not a real number")]
    [InlineData("ln(0)", 1, "is too large (not a finite number)")]
    [InlineData("1e200*1e200", 1, "'1e200*1e200' is too large")]
    [InlineData("2^10000", 1, "too large")]
    [InlineData("(-8)^(1/3)", 1, "not a real number")]
    [InlineData("(1e200*s)*(1e200*s)", 1, "too large")]
    public void Values_that_cannot_be_formed_are_located_errors(string text, int column, string fragment)
    {
        var e = EvalError(text, ("K", 1.0));
        Assert.Contains(fragment, e.Message, StringComparison.Ordinal);
        Assert.Equal(new SourcePosition(1, column), e.Position);
    }

    [Theory]
    [InlineData("K*ln(-1)", 3, "'ln(-1)' is not a real number")]
    [InlineData("K/0", 3, "division by zero: '0' is 0")]
    [InlineData("s/(2-2)", 3, "division by zero: '(2-2)' is 0")]
    [InlineData("K^(1/0)", 6, "division by zero")]
    [InlineData("(1e200*1e200)*s", 1, "too large")]
    [InlineData("1/0", 3, "division by zero")]
    [InlineData("K*0^-1", 3, "division by zero")]
    public void Constant_parts_without_a_finite_value_are_refused_when_parsed(string text, int column, string fragment)
    {
        // Reported at load time, before any parameter value is known.
        var e = ParseError(text);
        Assert.Contains(fragment, e.Message, StringComparison.Ordinal);
        Assert.Equal(new SourcePosition(1, column), e.Position);
    }

    [Fact]
    public void A_missing_value_is_reported_at_the_first_use_of_the_name()
    {
        var e = EvalError("s + 2*tau");
        Assert.Equal("no value for parameter 'tau'", e.Message);
        Assert.Equal(new SourcePosition(1, 7), e.Position);
    }

    [Fact]
    public void Values_that_can_be_formed_give_no_error()
    {
        var parsed = Parse("K/(K-1)");
        Assert.True(parsed.TryEvaluate(ImmutableDictionary<string, double>.Empty.Add("K", 3.0), out var f, out var error));
        Assert.Null(error);
        Assert.Equal(1.5, f.Numerator[0] / f.Denominator[0], 1e-15);
    }
}
