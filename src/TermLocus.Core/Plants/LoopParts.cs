using System.Collections.Immutable;
using System.Globalization;
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
    /// <summary>Pole magnitude, rad/s, past which a failed root search is blamed on a negligible leading coefficient.</summary>
    public const double MaxPoleMagnitude = 1e300;

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
        WithComputablePoles(given is not null ? GivenCharacteristic(slots) : FromLoopGain(LoopGain(slots)));

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

    // The closed-loop poles must be computable: a leading coefficient negligible next to the others (a sub-normal J,
    // say) puts poles beyond what a double holds, and coefficients spread over hundreds of decades defeat the root
    // finder. Solving once here turns both into a located error instead of a failure far from the file.
    private Polynomial WithComputablePoles(Polynomial p)
    {
        if (p.Degree < 1 || PolynomialRoots.TryFind(p, out _))
        {
            return p;
        }

        var magnitudes = p.Coefficients.Where(c => c != 0.0).Select(Math.Abs).ToArray();
        var message = LogRootBound(p) > Math.Log(MaxPoleMagnitude)
            ? string.Create(CultureInfo.InvariantCulture, $"the characteristic polynomial's leading coefficient ({p.Leading:G3}) is negligible next to the others: a closed-loop pole would lie beyond {MaxPoleMagnitude:G1} rad/s for these parameter values")
            : string.Create(CultureInfo.InvariantCulture, $"the closed-loop poles cannot be computed for these parameter values: the characteristic polynomial's coefficients range from {magnitudes.Min():G3} to {magnitudes.Max():G3}, too wide for double precision");
        throw new PlantFileException(blame.ErrorAt(0, message));
    }

    // Fujiwara's bound 2·max_k |a(n-k)/a(n)|^(1/k) on every root's magnitude, as a natural logarithm (no overflow).
    private static double LogRootBound(Polynomial p)
    {
        int n = p.Degree;
        double logLeading = Math.Log(Math.Abs(p.Leading));
        double logBound = double.NegativeInfinity;
        for (int k = 1; k <= n; k++)
        {
            double c = Math.Abs(p[n - k]) / (k == n ? 2.0 : 1.0);
            logBound = c == 0.0 ? logBound : Math.Max(logBound, (Math.Log(c) - logLeading) / k);
        }

        return logBound + Math.Log(2.0);
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
