namespace TermLocus.Core.Expressions;

/// <summary>
/// A ratio of two <see cref="BivariatePolynomial"/>s, formed by exactly the rules of <see cref="Fraction"/>, so that
/// substituting a value for p gives the numeric fraction (up to rounding).
/// </summary>
internal sealed record SweptFraction(BivariatePolynomial Numerator, BivariatePolynomial Denominator)
{
    public static SweptFraction Constant(double c) => new(BivariatePolynomial.Constant(c), BivariatePolynomial.One);

    /// <summary>True when the value is a number: free of s and of p.</summary>
    public bool IsConstant => Numerator.IsConstant && Denominator.IsConstant;

    /// <summary>The number, for a constant.</summary>
    public double Scalar => Numerator.ConstantValue / Denominator.ConstantValue;

    public int DegreeInP => Math.Max(Numerator.DegreeInP, Denominator.DegreeInP);

    public static SweptFraction Add(SweptFraction a, SweptFraction b) =>
        new(Times(a.Numerator, b.Denominator) + Times(b.Numerator, a.Denominator), Times(a.Denominator, b.Denominator));

    public static SweptFraction Subtract(SweptFraction a, SweptFraction b) =>
        new(Times(a.Numerator, b.Denominator) - Times(b.Numerator, a.Denominator), Times(a.Denominator, b.Denominator));

    public static SweptFraction Multiply(SweptFraction a, SweptFraction b) =>
        new(Times(a.Numerator, b.Numerator), Times(a.Denominator, b.Denominator));

    public static SweptFraction Divide(SweptFraction a, SweptFraction b) =>
        new(Times(a.Numerator, b.Denominator), Times(a.Denominator, b.Numerator));

    public static SweptFraction Negate(SweptFraction a) => new(-a.Numerator, a.Denominator);

    public static SweptFraction Power(SweptFraction a, int exponent) => exponent >= 0
        ? new(a.Numerator.Pow(exponent), a.Denominator.Pow(exponent))
        : new(a.Denominator.Pow(-exponent), a.Numerator.Pow(-exponent));

    private static BivariatePolynomial Times(BivariatePolynomial a, BivariatePolynomial b) =>
        ReferenceEquals(b, BivariatePolynomial.One) ? a : ReferenceEquals(a, BivariatePolynomial.One) ? b : a * b;
}
