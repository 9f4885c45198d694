using TermLocus.Core.Algebra;

namespace TermLocus.Core.Expressions;

/// <summary>
/// A ratio of two polynomials in the variable, formed the way the language defines it: sums cross-multiply,
/// products multiply, nothing is ever cancelled (a cancelled pole is still a pole).
/// </summary>
/// <param name="Numerator">Ascending coefficients.</param>
/// <param name="Denominator">Ascending coefficients; never zero once checked by <see cref="NumericAlgebra"/>.</param>
internal readonly record struct Fraction(Polynomial Numerator, Polynomial Denominator)
{
    public static Fraction One => new(Polynomial.One, Polynomial.One);

    public static Fraction Constant(double c) => new(Polynomial.Constant(c), Polynomial.One);

    /// <summary>The value of a fraction free of the variable (both parts constant).</summary>
    public double Scalar => Numerator[0] / Denominator[0];

    public static Fraction Add(Fraction a, Fraction b) =>
        new(Times(a.Numerator, b.Denominator) + Times(b.Numerator, a.Denominator), Times(a.Denominator, b.Denominator));

    public static Fraction Subtract(Fraction a, Fraction b) =>
        new(Times(a.Numerator, b.Denominator) - Times(b.Numerator, a.Denominator), Times(a.Denominator, b.Denominator));

    public static Fraction Multiply(Fraction a, Fraction b) =>
        new(Times(a.Numerator, b.Numerator), Times(a.Denominator, b.Denominator));

    public static Fraction Divide(Fraction a, Fraction b) =>
        new(Times(a.Numerator, b.Denominator), Times(a.Denominator, b.Numerator));

    public static Fraction Negate(Fraction a) => new(-a.Numerator, a.Denominator);

    /// <summary>A whole power; a negative exponent swaps numerator and denominator.</summary>
    public static Fraction Power(Fraction a, int exponent) => exponent >= 0
        ? new(a.Numerator.Pow(exponent), a.Denominator.Pow(exponent))
        : new(a.Denominator.Pow(-exponent), a.Numerator.Pow(-exponent));

    /// <summary>The same value as a <see cref="RationalFunction"/> (throws if the denominator is zero).</summary>
    public RationalFunction ToRationalFunction() => new(Numerator, Denominator);

    /// <summary>True when every coefficient is finite and the denominator is not zero.</summary>
    public bool IsUsable => !Denominator.IsZero && AllFinite(Numerator) && AllFinite(Denominator);

    // Multiplying by the constant 1 gives the same coefficients bit for bit, so skipping it changes nothing but time.
    private static Polynomial Times(Polynomial a, Polynomial b) =>
        IsOne(b) ? a : IsOne(a) ? b : a * b;

    private static bool IsOne(Polynomial p) => p.Degree == 0 && p[0] == 1.0;

    private static bool AllFinite(Polynomial p)
    {
        foreach (double c in p.Coefficients)
        {
            if (!double.IsFinite(c))
            {
                return false;
            }
        }

        return true;
    }
}
