using TermLocus.Core.Algebra;
using TermLocus.Core.Expressions;

namespace TermLocus.Core.Plants;

/// <summary>
/// The loop gain of a loop built from controller, plant and sensor, as a list of factors in the plane's variable
/// whose product (formed in order, nothing cancelled) is the loop gain L; the characteristic polynomial is the
/// numerator of 1 ± L. One implementation per plane: continuous (<see cref="ContinuousLoopPath"/>) and sampled
/// (<see cref="SampledLoopPath"/>).
/// </summary>
internal abstract class LoopPath
{
    protected LoopPath(ParsedExpression blame) => Blame = blame;

    /// <summary>The expression an error about the whole loop is reported at (the plant).</summary>
    public ParsedExpression Blame { get; }

    /// <summary>The factors at these parameter values.</summary>
    /// <exception cref="PlantFileException">A factor cannot be formed at these values.</exception>
    public abstract Fraction[] Factors(double[] slots);

    /// <summary>The numerator of reference-to-output whose denominator is the characteristic polynomial.</summary>
    public abstract Polynomial ReferenceNumerator(double[] slots, Fraction[] factors);

    /// <summary>The factors with the swept parameter kept symbolic; null when any is not a polynomial ratio in it.</summary>
    public abstract SweptFraction[]? SweptFactors(double[] slots, int swept);

    /// <summary>The factors as a function of the swept value; work that does not depend on it is done here, once.</summary>
    public abstract Func<double, Fraction[]> FactorFamily(double[] slots, int swept);

    /// <summary>The factors among whose numerators and denominators cancelled (hidden) poles are looked for.</summary>
    public abstract Fraction[] CancellableFactors(Fraction[] factors);

    /// <summary>A copy of <paramref name="slots"/> with one value replaced.</summary>
    protected static double[] With(double[] slots, int slot, double value)
    {
        var v = (double[])slots.Clone();
        v[slot] = value;
        return v;
    }

    /// <summary>The value of an optional part; an absent part is 1.</summary>
    protected static Fraction Evaluate(LoopExpression? part, double[] slots) => part?.Evaluate(slots) ?? Fraction.One;

    /// <summary>The value of an optional part with p symbolic; an absent part is 1.</summary>
    protected static SweptFraction? EvaluateSwept(LoopExpression? part, double[] slots, int swept) =>
        part is null ? SweptFraction.Constant(1.0) : part.EvaluateSwept(slots, swept);
}
