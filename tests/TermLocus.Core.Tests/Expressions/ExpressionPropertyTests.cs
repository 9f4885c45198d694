using System.Numerics;
using CsCheck;
using TermLocus.Core.Algebra;
using TermLocus.Core.Expressions;
using TermLocus.Core.Plants;
using static TermLocus.Core.Tests.Expressions.ExpressionTestText;

namespace TermLocus.Core.Tests.Expressions;

public class ExpressionPropertyTests
{
    // Coefficients across the whole double range, with exact zeros mixed in so sparse polynomials occur.
    private static readonly Gen<double> Coefficient = Gen.Frequency(
        (1, (IGen<double>)Gen.Const(0.0)),
        (4, Gen.Select(Gen.Double[-10.0, 10.0], Gen.Int[-300, 300], (m, e) => m * Math.Pow(10.0, e))));

    private static readonly Gen<Polynomial> AnyPolynomial =
        Coefficient.Array[0, 12].Select(c => Polynomial.FromAscending(c));

    private static readonly Gen<Polynomial> SmallPolynomial =
        Gen.Double[-10.0, 10.0].Array[1, 7].Select(c => Polynomial.FromAscending(c));

    [Fact]
    public void Printing_then_parsing_gives_back_the_same_polynomial_exactly()
    {
        AnyPolynomial.Sample(p =>
        {
            var f = Eval(ExpressionPrinter.Print(p));
            Assert.Equal(p, f.Numerator);
            Assert.Equal(Polynomial.One, f.Denominator);
        });
    }

    [Fact]
    public void Printing_then_parsing_gives_back_the_same_rational_function_exactly()
    {
        Gen.Select(AnyPolynomial, AnyPolynomial.Where(d => !d.IsZero)).Sample((n, d) =>
        {
            var f = Eval(ExpressionPrinter.Print(new RationalFunction(n, d)));
            Assert.Equal(n, f.Numerator);
            Assert.Equal(d, f.Denominator);
        });
    }

    [Fact]
    public void The_roots_of_a_parsed_product_are_the_roots_of_its_factors()
    {
        // Checked against MathNet.Numerics' own polynomial root finder; roots are distinct integers and
        // half-integer complex pairs, so every root is simple and well conditioned.
        var gen = Gen.Select(Gen.Int[-6, 6].ArrayUnique[2, 7], Gen.Int[0, 100], Gen.Int[-3, 3], Gen.Int[0, 2]);
        gen.Sample((integers, split, pairReal, pairImaginary) =>
        {
            int k = 1 + (split % (integers.Length - 1));
            var left = integers[..k].Select(r => new Complex(r, 0)).ToList();
            var right = integers[k..].Select(r => new Complex(r, 0)).ToList();
            if (pairImaginary > 0)
            {
                right.Add(new Complex(pairReal + 0.5, pairImaginary));
                right.Add(new Complex(pairReal + 0.5, -pairImaginary));
            }

            var a = Polynomial.FromRoots(left).Scale(2.5);
            var b = Polynomial.FromRoots(right);
            var product = Eval($"({ExpressionPrinter.Print(a)})*({ExpressionPrinter.Print(b)})").Numerator;

            var found = new MathNet.Numerics.Polynomial(product.Coefficients.ToArray()).Roots();
            var expected = left.Concat(right).ToList();
            Assert.Equal(expected.Count, found.Length);
            foreach (var root in expected)
            {
                Assert.Contains(found, z => Complex.Abs(z - root) < 1e-7);
            }
        });
    }

    [Fact]
    public void Multiplication_distributes_over_addition_within_rounding()
    {
        Gen.Select(SmallPolynomial, SmallPolynomial, SmallPolynomial).Sample((a, b, c) =>
        {
            string pa = ExpressionPrinter.Print(a), pb = ExpressionPrinter.Print(b), pc = ExpressionPrinter.Print(c);
            var left = Eval($"(({pa}) + ({pb}))*({pc})").Numerator;
            var right = Eval($"({pa})*({pc}) + ({pb})*({pc})").Numerator;

            // Each coefficient is a sum of at most 7 products of numbers below 10 in size: rounding stays far under 1e-11.
            double scale = 1.0 + ((a.MaxAbsCoefficient() + b.MaxAbsCoefficient()) * c.MaxAbsCoefficient());
            int n = Math.Max(left.Degree, right.Degree);
            for (int k = 0; k <= n; k++)
            {
                Assert.Equal(left[k], right[k], 1e-13 * scale * 8);
            }
        });
    }

    [Fact]
    public void Evaluation_agrees_with_the_value_at_a_point()
    {
        // N/D at a complex point equals the expression computed directly in complex arithmetic (common practice).
        Gen.Select(Gen.Double[0.1, 10.0], Gen.Double[0.1, 10.0], Gen.Double[-3.0, 3.0], Gen.Double[0.1, 3.0]).Sample((k, tau, x, y) =>
        {
            var f = Eval("k*(s + 2)/(s*(tau*s + 1)^2) - 1/(s + 3)", ("k", k), ("tau", tau));
            var s = new Complex(x, y);
            var direct = (k * (s + 2) / (s * Complex.Pow((tau * s) + 1, 2))) - (1 / (s + 3));
            var viaFraction = f.Evaluate(s);
            Assert.True(Complex.Abs(viaFraction - direct) <= 1e-10 * (1 + Complex.Abs(direct)), $"{viaFraction} vs {direct}");
        });
    }

    [Fact]
    public void Random_text_either_parses_or_fails_with_a_located_error()
    {
        // Robustness: no other exception type, no hang, and the position is inside the text.
        var text = Gen.Char["0123456789.eE+-*/^()  sKpiqrtxlnab_\n\u00D7z"].Array[0, 40].Select(c => new string(c));
        text.Sample(t =>
        {
            if (ExpressionParser.TryParse(ExpressionText.Inline("plant", t), FileName, out var parsed, out var error))
            {
                var values = parsed.DistinctNames.ToDictionary(n => n, n => 0.5);
                _ = parsed.TryEvaluate(values, out _, out _);
            }
            else
            {
                Assert.InRange(error.Position.Column, 1, t.Length + 1);
                Assert.False(string.IsNullOrWhiteSpace(error.Message));
            }
        });
    }
}
