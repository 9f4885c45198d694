namespace TermLocus.Core.Expressions;

/// <summary>
/// <c>Base ^ Exponent</c>. <see cref="WholeExponent"/> is set when the exponent is written as a whole number
/// (possibly negated) of magnitude at most <see cref="ExpressionLimits.MaxWholeExponent"/>; such powers are exact
/// products. It is always set, and non-negative, when the base contains the variable.
/// </summary>
internal sealed record PowerNode(int Start, int End, ExpressionNode Base, ExpressionNode Exponent, int? WholeExponent)
    : ExpressionNode(Start, End)
{
    public override bool ContainsVariable => Base.ContainsVariable;

    public override DegreeBound Degree =>
        Base.ContainsVariable ? DegreeBound.Power(Base.Degree, WholeExponent ?? 0) : DegreeBound.Constant;
}
