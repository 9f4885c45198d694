using TermLocus.Core.Algebra;

namespace TermLocus.Core.Expressions;

/// <summary>
/// Evaluates with every parameter a number: values are <see cref="Fraction"/>s of real polynomials. Every result is
/// checked, so a division by zero or an overflow is blamed on the part of the text that caused it.
/// </summary>
internal sealed class NumericAlgebra : IExpressionAlgebra<Fraction>
{
    private readonly double[] values;
    private readonly int[]? slotOfName;

    /// <param name="values">Parameter values, indexed by slot.</param>
    /// <param name="slotOfName">Slot of each distinct name of the expression, or null when slot = name index.</param>
    public NumericAlgebra(double[] values, int[]? slotOfName)
    {
        this.values = values;
        this.slotOfName = slotOfName;
    }

    public Fraction Number(double value) => Fraction.Constant(value);

    public Fraction Parameter(NameNode site)
    {
        double v = values[slotOfName is null ? site.NameIndex : slotOfName[site.NameIndex]];
        return double.IsFinite(v) ? Fraction.Constant(v) : throw ExpressionEvaluationException.NotFinite(site, v);
    }

    public Fraction Variable() => new(Polynomial.X, Polynomial.One);

    public Fraction Negate(Fraction a) => Fraction.Negate(a);

    public Fraction Add(Fraction a, Fraction b, ExpressionNode site) => Checked(Fraction.Add(a, b), site);

    public Fraction Subtract(Fraction a, Fraction b, ExpressionNode site) => Checked(Fraction.Subtract(a, b), site);

    public Fraction Multiply(Fraction a, Fraction b, ExpressionNode site) => Checked(Fraction.Multiply(a, b), site);

    public Fraction Divide(Fraction a, Fraction b, ExpressionNode divisor)
    {
        if (b.Numerator.IsZero)
        {
            throw ExpressionEvaluationException.DivisionByZero(divisor);
        }

        return Checked(Fraction.Divide(a, b), divisor);
    }

    public Fraction WholePower(Fraction a, int exponent, PowerNode site)
    {
        if (exponent < 0 && a.Numerator.IsZero)
        {
            throw ExpressionEvaluationException.DivisionByZero(site);
        }

        return Checked(Fraction.Power(a, exponent), site);
    }

    public Fraction RealPower(Fraction a, Fraction b, PowerNode site) =>
        ScalarResult(Math.Pow(a.Scalar, b.Scalar), site);

    public Fraction Apply(ScalarFunction function, Fraction a, FunctionNode site) =>
        ScalarResult(ScalarFunctions.Apply(function, a.Scalar), site);

    private static Fraction ScalarResult(double value, ExpressionNode site) =>
        double.IsFinite(value) ? Fraction.Constant(value) : throw ExpressionEvaluationException.NotFinite(site, value);

    private static Fraction Checked(Fraction f, ExpressionNode site)
    {
        if (f.IsUsable)
        {
            return f;
        }

        if (f.Denominator.IsZero)
        {
            throw new ExpressionEvaluationException(site, string.Empty, " underflows to a zero denominator for these parameter values");
        }

        throw ExpressionEvaluationException.NotFinite(site, FirstNonFinite(f));
    }

    private static double FirstNonFinite(Fraction f)
    {
        foreach (double c in f.Numerator.Coefficients.Concat(f.Denominator.Coefficients))
        {
            if (!double.IsFinite(c))
            {
                return c;
            }
        }

        return double.NaN;
    }
}
