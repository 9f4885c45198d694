namespace TermLocus.Core.Expressions;

/// <summary>
/// Upper bounds on the degrees in the variable of an expression's numerator and denominator, counted the way the
/// evaluator forms fractions (no cancellation). Saturates instead of overflowing.
/// </summary>
internal readonly record struct DegreeBound(int Numerator, int Denominator)
{
    private const long Saturation = int.MaxValue / 4;

    public static DegreeBound Constant => new(0, 0);

    public static DegreeBound Variable => new(1, 0);

    /// <summary>The larger of the two bounds: what the degree cap is checked against.</summary>
    public int Max => Math.Max(Numerator, Denominator);

    public static DegreeBound Sum(DegreeBound a, DegreeBound b) =>
        Make(Math.Max((long)a.Numerator + b.Denominator, (long)b.Numerator + a.Denominator), (long)a.Denominator + b.Denominator);

    public static DegreeBound Product(DegreeBound a, DegreeBound b) =>
        Make((long)a.Numerator + b.Numerator, (long)a.Denominator + b.Denominator);

    public static DegreeBound Quotient(DegreeBound a, DegreeBound b) =>
        Make((long)a.Numerator + b.Denominator, (long)a.Denominator + b.Numerator);

    public static DegreeBound Power(DegreeBound a, int exponent) =>
        Make((long)a.Numerator * exponent, (long)a.Denominator * exponent);

    private static DegreeBound Make(long numerator, long denominator) =>
        new((int)Math.Min(numerator, Saturation), (int)Math.Min(denominator, Saturation));
}
