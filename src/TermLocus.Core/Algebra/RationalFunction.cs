using System.Numerics;

namespace TermLocus.Core.Algebra;

/// <summary>
/// An immutable ratio of two real polynomials, <c>Numerator / Denominator</c>. No common factors are ever
/// cancelled: a loop's hidden poles must stay visible. The denominator is never the zero polynomial.
/// </summary>
public sealed record RationalFunction
{
    /// <summary>Creates N/D. Throws <see cref="DivideByZeroException"/> when <paramref name="denominator"/> is zero.</summary>
    public RationalFunction(Polynomial numerator, Polynomial denominator)
    {
        if (denominator.IsZero)
        {
            throw new DivideByZeroException("Denominator polynomial is zero.");
        }

        Numerator = numerator;
        Denominator = denominator;
    }

    /// <summary>The numerator polynomial (ascending coefficients).</summary>
    public Polynomial Numerator { get; }

    /// <summary>The denominator polynomial (ascending coefficients), never zero.</summary>
    public Polynomial Denominator { get; }

    /// <summary>The constant 1.</summary>
    public static RationalFunction One { get; } = new(Polynomial.One, Polynomial.One);

    /// <summary>The rational function equal to a polynomial.</summary>
    public static RationalFunction FromPolynomial(Polynomial p) => new(p, Polynomial.One);

    /// <summary>A constant.</summary>
    public static RationalFunction Constant(double c) => FromPolynomial(Polynomial.Constant(c));

    /// <summary>True when the denominator is a non-zero constant (the function is a polynomial).</summary>
    public bool IsPolynomial => Denominator.Degree == 0;

    /// <summary>Value at a complex point; infinite or NaN at a pole, as complex division gives.</summary>
    public Complex Evaluate(Complex s) => Numerator.Evaluate(s) / Denominator.Evaluate(s);

    /// <summary>Sum, over the product of the denominators (no cancellation).</summary>
    public static RationalFunction operator +(RationalFunction a, RationalFunction b) =>
        a.Denominator.Equals(b.Denominator)
            ? new(a.Numerator + b.Numerator, a.Denominator)
            : new(a.Numerator * b.Denominator + b.Numerator * a.Denominator, a.Denominator * b.Denominator);

    /// <summary>Negation.</summary>
    public static RationalFunction operator -(RationalFunction a) => new(-a.Numerator, a.Denominator);

    /// <summary>Difference.</summary>
    public static RationalFunction operator -(RationalFunction a, RationalFunction b) => a + (-b);

    /// <summary>Product (no cancellation).</summary>
    public static RationalFunction operator *(RationalFunction a, RationalFunction b) =>
        new(a.Numerator * b.Numerator, a.Denominator * b.Denominator);

    /// <summary>Quotient. Throws <see cref="DivideByZeroException"/> when <paramref name="b"/> is identically zero.</summary>
    public static RationalFunction operator /(RationalFunction a, RationalFunction b) =>
        new(a.Numerator * b.Denominator, a.Denominator * b.Numerator);

    /// <summary>A non-negative integer power.</summary>
    public RationalFunction Pow(int exponent) => new(Numerator.Pow(exponent), Denominator.Pow(exponent));

    /// <inheritdoc/>
    public override string ToString() => $"({Numerator}) / ({Denominator})";
}
