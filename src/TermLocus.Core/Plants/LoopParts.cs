using System.Collections.Immutable;
using System.Globalization;
using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Expressions;

namespace TermLocus.Core.Plants;

/// <summary>
/// The bound expressions of a loop (controller C, plant G, sensor H and the feedback sign, or a given
/// characteristic) and the arithmetic that turns them into closed-loop polynomials. Works on parameter arrays.
/// </summary>
internal sealed class LoopParts
{
    /// <summary>Pole magnitude, rad/s, past which a failed root search is blamed on a negligible leading coefficient.</summary>
    public const double MaxPoleMagnitude = 1e300;

    private readonly LoopExpression?[] path;
    private readonly LoopExpression? given;
    private readonly FeedbackSign feedback;
    private readonly ParsedExpression blame;

    private LoopParts(LoopExpression?[] path, LoopExpression? given, FeedbackSign feedback, ParsedExpression blame)
    {
        this.path = path;
        this.given = given;
        this.feedback = feedback;
        this.blame = blame;
    }

    /// <summary>The given characteristic, or null for a loop built from C, G and H.</summary>
    public LoopExpression? Given => given;

    /// <summary>Parses and binds the loop of <paramref name="plant"/>.</summary>
    public static LoopParts Bind(Plant plant, ParameterSlots slots)
    {
        var loop = plant.Loop;
        if ((loop.Plant is null) == (loop.Characteristic is null))
        {
            throw new ArgumentException("The loop must give exactly one of 'plant' and 'characteristic'.", nameof(plant));
        }

        LoopExpression? BindOrNull(ExpressionText? text) =>
            text is null ? null : LoopExpression.Bind(text, plant.Path, slots.SlotByName);

        if (loop.Characteristic is not null)
        {
            var given = BindOrNull(loop.Characteristic)!;
            int division = given.Parsed.FirstDivisionByVariable();
            if (division >= 0)
            {
                throw new PlantFileException(given.Parsed.ErrorAt(
                    division, "the characteristic must be a polynomial in s: it cannot divide by an expression containing s"));
            }

            return new LoopParts([], given, loop.Feedback, given.Parsed);
        }

        var g = BindOrNull(loop.Plant)!;
        LoopExpression?[] path = [BindOrNull(loop.Controller), g, BindOrNull(loop.Sensor)];
        CheckLoopDegree(path, g.Parsed);
        return new LoopParts(path, null, loop.Feedback, g.Parsed);
    }

    public Polynomial Characteristic(double[] slots) =>
        WithComputablePoles(given is not null ? GivenCharacteristic(slots) : FromLoopGain(LoopGain(slots)));

    /// <summary>C·G·H formed as (C·G)·H, nothing cancelled.</summary>
    public Fraction LoopGain(double[] slots) => Product(Evaluate(path, slots));

    public RationalFunction ReferenceToOutput(double[] slots)
    {
        var f = Evaluate(path, slots);
        var gain = Product(f);
        return new RationalFunction(f[0].Numerator * f[1].Numerator * f[2].Denominator, FromLoopGain(gain));
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
            return p => GivenCharacteristic(With(slots, swept, p));
        }

        var fixedParts = new Fraction?[path.Length];
        for (int i = 0; i < path.Length; i++)
        {
            fixedParts[i] = path[i] is { } e && e.Uses(swept) ? null : Evaluate(path[i], slots);
        }

        return p =>
        {
            var v = With(slots, swept, p);
            var f = new Fraction[path.Length];
            for (int i = 0; i < f.Length; i++)
            {
                f[i] = fixedParts[i] ?? Evaluate(path[i], v);
            }

            return FromLoopGain(Product(f));
        };
    }

    public ImmutableArray<Complex> HiddenPoles(double[] slots, double relativeTolerance)
    {
        var f = Evaluate(path, slots);
        return f.Any(x => x.Numerator.IsZero)
            ? []
            : LoopModelHiddenPoles.Find(f.Select(x => x.Numerator), f.Select(x => x.Denominator), relativeTolerance);
    }

    private BivariatePolynomial? SweptCharacteristic(double[] slots, int swept)
    {
        SweptFraction? gain = null;
        foreach (var part in path)
        {
            var value = part is null ? SweptFraction.Constant(1.0) : part.EvaluateSwept(slots, swept);
            if (value is null)
            {
                return null;
            }

            gain = gain is null ? value : SweptFraction.Multiply(gain, value);
        }

        return gain is null ? null
            : feedback == FeedbackSign.Negative ? gain.Denominator + gain.Numerator : gain.Denominator - gain.Numerator;
    }

    private Polynomial GivenCharacteristic(double[] slots) => Checked(given!.Evaluate(slots).Numerator, "the characteristic polynomial");

    private Polynomial FromLoopGain(Fraction gain)
    {
        var p = feedback == FeedbackSign.Negative ? gain.Denominator + gain.Numerator : gain.Denominator - gain.Numerator;
        string sign = feedback == FeedbackSign.Negative ? "+" : "-";
        return Checked(p, $"the characteristic polynomial (numerator of 1 {sign} controller*plant*sensor)");
    }

    private Fraction Product(Fraction[] f)
    {
        var gain = Fraction.Multiply(Fraction.Multiply(f[0], f[1]), f[2]);
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

    private static Fraction[] Evaluate(LoopExpression?[] parts, double[] slots) =>
        parts.Select(p => Evaluate(p, slots)).ToArray();

    private static Fraction Evaluate(LoopExpression? part, double[] slots) => part?.Evaluate(slots) ?? Fraction.One;

    private static double[] With(double[] slots, int slot, double value)
    {
        var v = (double[])slots.Clone();
        v[slot] = value;
        return v;
    }

    private static void CheckLoopDegree(LoopExpression?[] path, ParsedExpression blame)
    {
        var bound = DegreeBound.Constant;
        foreach (var part in path)
        {
            bound = DegreeBound.Product(bound, part?.Parsed.Degree ?? DegreeBound.Constant);
        }

        if (bound.Max > ExpressionLimits.MaxDegree)
        {
            throw new PlantFileException(blame.ErrorAt(
                0, $"degree too high: controller*plant*sensor would reach degree {bound.Max} (at most {ExpressionLimits.MaxDegree})"));
        }
    }
}
