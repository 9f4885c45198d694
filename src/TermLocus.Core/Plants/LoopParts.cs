using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Expressions;

namespace TermLocus.Core.Plants;

/// <summary>
/// The bound loop of a plant file (a <see cref="LoopPath"/> and the feedback sign, or a given characteristic) and
/// the arithmetic that turns it into closed-loop polynomials in the plane's variable. Works on parameter arrays.
/// </summary>
internal sealed class LoopParts
{
    private readonly LoopExpression? given;
    private readonly FeedbackSign feedback;
    private readonly ParsedExpression blame;

    private LoopParts(LoopPath? path, LoopExpression? given, FeedbackSign feedback, ParsedExpression blame)
    {
        Path = path;
        this.given = given;
        this.feedback = feedback;
        this.blame = blame;
    }

    /// <summary>The given characteristic, or null for a loop built from C, G and H.</summary>
    public LoopExpression? Given => given;

    /// <summary>The loop built from C, G and H, or null when the characteristic is given.</summary>
    public LoopPath? Path { get; }

    /// <summary>The sign of the feedback.</summary>
    public FeedbackSign Feedback => feedback;

    /// <summary>Parses and binds the loop of <paramref name="plant"/>.</summary>
    public static LoopParts Bind(Plant plant, ParameterSlots slots, int delayOrder)
    {
        var loop = plant.Loop;
        if ((loop.Plant is null) == (loop.Characteristic is null))
        {
            throw new ArgumentException("The loop must give exactly one of 'plant' and 'characteristic'.", nameof(plant));
        }

        LoopBinder.CheckTimes(loop);
        if (loop.Characteristic is not null)
        {
            var given = LoopBinder.BindCharacteristic(plant, slots);
            return new LoopParts(null, given, loop.Feedback, given.Parsed);
        }

        var path = LoopBinder.BindPath(plant, slots, delayOrder);
        return new LoopParts(path, null, loop.Feedback, path.Blame);
    }

    public Polynomial Characteristic(double[] slots) =>
        given is not null ? GivenCharacteristic(slots) : FromLoopGain(LoopGain(slots));

    /// <summary>The product of the path's factors in order, nothing cancelled.</summary>
    public Fraction LoopGain(double[] slots) => Product(Path!.Factors(slots));

    public RationalFunction ReferenceToOutput(double[] slots)
    {
        var factors = Path!.Factors(slots);
        var characteristic = FromLoopGain(Product(factors));
        return new RationalFunction(Path.ReferenceNumerator(slots, factors), characteristic);
    }

    /// <summary>
    /// The exact affine split in the parameter at <paramref name="swept"/> of P divided by the highest power of p
    /// that divides it, or null when that is not affine in p.
    /// </summary>
    public AffineSplit? AffineSplit(double[] slots, int swept)
    {
        BivariatePolynomial? p = given is not null ? given.EvaluateSwept(slots, swept)?.Numerator : SweptCharacteristic(slots, swept);

        // A parameter under a fraction bar multiplies the whole polynomial by a power of itself, e.g. 1/J gives
        // J·(J s^2 + B s + K): dividing it out changes no root for p != 0 and lets such loops count as affine.
        p = p?.DivideByPowerOfP(p.CommonPowerOfP());
        return p is { DegreeInP: 1 } ? new AffineSplit(p.CoefficientOfP(0), p.CoefficientOfP(1)) : null;
    }

    /// <summary>P as a function of the swept value; parts that do not use it are formed once, here.</summary>
    public Func<double, Polynomial> NumericFamily(double[] slots, int swept)
    {
        if (given is not null)
        {
            return p =>
            {
                var v = (double[])slots.Clone();
                v[swept] = p;
                return GivenCharacteristic(v);
            };
        }

        var factors = Path!.FactorFamily(slots, swept);
        return p => FromLoopGain(Product(factors(p)));
    }

    public ImmutableArray<Complex> HiddenPoles(double[] slots, double relativeTolerance)
    {
        var f = Path!.CancellableFactors(Path.Factors(slots));
        return f.Any(x => x.Numerator.IsZero)
            ? []
            : LoopModelHiddenPoles.Find(f.Select(x => x.Numerator), f.Select(x => x.Denominator), relativeTolerance);
    }

    private BivariatePolynomial? SweptCharacteristic(double[] slots, int swept)
    {
        var factors = Path!.SweptFactors(slots, swept);
        if (factors is null)
        {
            return null;
        }

        var gain = factors[0];
        foreach (var factor in factors.Skip(1))
        {
            gain = SweptFraction.Multiply(gain, factor);
        }

        return feedback == FeedbackSign.Negative ? gain.Denominator + gain.Numerator : gain.Denominator - gain.Numerator;
    }

    private Polynomial GivenCharacteristic(double[] slots) => Checked(given!.Evaluate(slots).Numerator, "the characteristic polynomial");

    private Polynomial FromLoopGain(Fraction gain)
    {
        var p = feedback == FeedbackSign.Negative ? gain.Denominator + gain.Numerator : gain.Denominator - gain.Numerator;
        string sign = feedback == FeedbackSign.Negative ? "+" : "-";
        return Checked(p, $"the characteristic polynomial (numerator of 1 {sign} controller*plant*sensor)");
    }

    private Fraction Product(Fraction[] factors)
    {
        var gain = factors[0];
        foreach (var f in factors.AsSpan(1))
        {
            gain = Fraction.Multiply(gain, f);
        }

        return gain.IsUsable
            ? gain
            : throw new PlantFileException(blame.ErrorAt(0, "the loop gain controller*plant*sensor is not finite for these parameter values"));
    }

    private Polynomial Checked(Polynomial p, string what)
    {
        if (p.IsZero)
        {
            throw new PlantFileException(blame.ErrorAt(0, $"{what} is identically zero for these parameter values"));
        }

        return p.Coefficients.All(double.IsFinite)
            ? p
            : throw new PlantFileException(blame.ErrorAt(0, $"{what} is not finite for these parameter values"));
    }
}
