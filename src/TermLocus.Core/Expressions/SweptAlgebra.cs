namespace TermLocus.Core.Expressions;

/// <summary>
/// Evaluates with one parameter, the swept one, kept as a symbol p: coefficients become polynomials in p, so the
/// characteristic polynomial's dependence on p can be read off exactly. A value that is not a polynomial in p
/// (p under sqrt, exp, ln, abs or a real power, or of too high a degree) is null, and null spreads: the caller then
/// treats the loop as not affine in p, which is always safe.
/// </summary>
internal sealed class SweptAlgebra : IExpressionAlgebra<SweptFraction?>
{
    private readonly double[] values;
    private readonly int[] slotOfName;
    private readonly int sweptSlot;

    /// <param name="values">Values of the other parameters, indexed by slot (the swept slot's entry is ignored).</param>
    /// <param name="slotOfName">Slot of each distinct name of the expression.</param>
    /// <param name="sweptSlot">The swept parameter's slot.</param>
    public SweptAlgebra(double[] values, int[] slotOfName, int sweptSlot)
    {
        this.values = values;
        this.slotOfName = slotOfName;
        this.sweptSlot = sweptSlot;
    }

    public SweptFraction? Number(double value) => SweptFraction.Constant(value);

    public SweptFraction? Parameter(NameNode site)
    {
        int slot = slotOfName[site.NameIndex];
        if (slot == sweptSlot)
        {
            return new SweptFraction(BivariatePolynomial.SweptParameter, BivariatePolynomial.One);
        }

        double v = values[slot];
        return double.IsFinite(v) ? SweptFraction.Constant(v) : throw ExpressionEvaluationException.NotFinite(site, v);
    }

    public SweptFraction? Variable() => new(BivariatePolynomial.Variable, BivariatePolynomial.One);

    public SweptFraction? Negate(SweptFraction? a) => a is null ? null : SweptFraction.Negate(a);

    public SweptFraction? Add(SweptFraction? a, SweptFraction? b, ExpressionNode site) =>
        a is null || b is null ? null : Kept(SweptFraction.Add(a, b));

    public SweptFraction? Subtract(SweptFraction? a, SweptFraction? b, ExpressionNode site) =>
        a is null || b is null ? null : Kept(SweptFraction.Subtract(a, b));

    public SweptFraction? Multiply(SweptFraction? a, SweptFraction? b, ExpressionNode site) =>
        a is null || b is null ? null : Kept(SweptFraction.Multiply(a, b));

    public SweptFraction? Divide(SweptFraction? a, SweptFraction? b, ExpressionNode divisor)
    {
        if (b is not null && b.Numerator.IsZero)
        {
            throw ExpressionEvaluationException.DivisionByZero(divisor);
        }

        return a is null || b is null ? null : Kept(SweptFraction.Divide(a, b));
    }

    public SweptFraction? WholePower(SweptFraction? a, int exponent, PowerNode site)
    {
        if (a is null)
        {
            return null;
        }

        if (exponent < 0 && a.Numerator.IsZero)
        {
            throw ExpressionEvaluationException.DivisionByZero(site);
        }

        return Kept(SweptFraction.Power(a, exponent));
    }

    public SweptFraction? RealPower(SweptFraction? a, SweptFraction? b, PowerNode site) =>
        a is { IsConstant: true } && b is { IsConstant: true } ? Scalar(Math.Pow(a.Scalar, b.Scalar), site) : null;

    public SweptFraction? Apply(ScalarFunction function, SweptFraction? a, FunctionNode site) =>
        a is { IsConstant: true } ? Scalar(ScalarFunctions.Apply(function, a.Scalar), site) : null;

    // Free of p, the numeric evaluation computes exactly these numbers, so its error is reported here too.
    private static SweptFraction Scalar(double value, ExpressionNode site) =>
        double.IsFinite(value) ? SweptFraction.Constant(value) : throw ExpressionEvaluationException.NotFinite(site, value);

    private static SweptFraction? Kept(SweptFraction f) =>
        !f.Denominator.IsZero && f.DegreeInP <= ExpressionLimits.MaxDegree && f.Numerator.AllFinite() && f.Denominator.AllFinite() ? f : null;
}
