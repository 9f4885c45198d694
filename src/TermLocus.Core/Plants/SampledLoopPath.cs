using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Expressions;
using TermLocus.Core.Time;

namespace TermLocus.Core.Plants;

/// <summary>
/// A sampled loop in z: the controller C(z) runs every T seconds; its output is held (zero-order hold), passes any
/// transport delay τ and drives the plant; the sensor output is sampled. Factors C(z) and (G·H)_τ(z), the exact
/// hold equivalent of G(s)·H(s)·e^{−sτ} (<see cref="ZeroOrderHold.Discretise(RationalFunction, double, double)"/>).
/// Reference to output at the sample instants: C·G_τ / (1 ± C·(GH)_τ) = N_C·N_{Gτ}·D_{Hz} / P, where D_{Hz} is the
/// monic Π(z − e^{pT}) over the sensor's poles (the part of (GH)_τ's denominator that G_τ lacks).
/// <para>Cost: when the swept parameter enters the plant or sensor other than as an overall factor, every value
/// of the family discretises G·H afresh: a state-space realisation, an (n+1)-square matrix exponential and n complex
/// n-square LU solves, O(n⁴) for a loop of order n (tens of microseconds for n = 6).</para>
/// </summary>
internal sealed class SampledLoopPath : LoopPath
{
    private readonly LoopExpression? controller;
    private readonly LoopExpression plant;
    private readonly LoopExpression? sensor;
    private readonly double sampleTime;
    private readonly double delay;

    public SampledLoopPath(LoopExpression? controller, LoopExpression plant, LoopExpression? sensor, double sampleTime, double delay)
        : base(plant.Parsed)
    {
        this.controller = controller;
        this.plant = plant;
        this.sensor = sensor;
        this.sampleTime = sampleTime;
        this.delay = delay;
    }

    public override Fraction[] Factors(double[] slots) => [Evaluate(controller, slots), HeldPlantAndSensor(slots)];

    public override Polynomial ReferenceNumerator(double[] slots, Fraction[] factors)
    {
        if (sensor is null)
        {
            return factors[0].Numerator * factors[1].Numerator;
        }

        var heldPlant = Hold(Usable(plant.Evaluate(slots)));
        var sensorPoles = sensor.Evaluate(slots).Denominator;
        var sensorPolesInZ = sensorPoles.Degree < 1
            ? Polynomial.One
            : Polynomial.FromRoots(PolynomialRoots.Find(sensorPoles).Select(p => Complex.Exp(p * sampleTime)));
        return factors[0].Numerator * heldPlant.Numerator * sensorPolesInZ;
    }

    public override SweptFraction[]? SweptFactors(double[] slots, int swept)
    {
        if (EvaluateSwept(controller, slots, swept) is not { } c)
        {
            return null;
        }

        if (!plant.Uses(swept) && sensor?.Uses(swept) != true)
        {
            return [c, SweptConstants.Of(HeldPlantAndSensor(slots))];
        }

        return SweptHeld(slots, swept) is { } held ? [c, held] : null;
    }

    public override Func<double, Fraction[]> FactorFamily(double[] slots, int swept)
    {
        var fixedController = controller?.Uses(swept) == true ? (Fraction?)null : Evaluate(controller, slots);
        var fixedHeld = plant.Uses(swept) || sensor?.Uses(swept) == true ? (Fraction?)null : HeldPlantAndSensor(slots);
        return p =>
        {
            var v = With(slots, swept, p);
            return [fixedController ?? Evaluate(controller, v), fixedHeld ?? HeldPlantAndSensor(v)];
        };
    }

    public override Fraction[] CancellableFactors(Fraction[] factors) => factors;

    /// <summary>C(z), G(s), H(s) and the denominator of (G·H)_τ(z) at these values, for the hybrid simulation.</summary>
    /// <exception cref="PlantFileException">A part cannot be formed, or plant·sensor cannot be held, at these values.</exception>
    public SampledLoopParts Parts(double[] slots) => new(
        Evaluate(controller, slots).ToRationalFunction(),
        Usable(plant.Evaluate(slots)).ToRationalFunction(),
        Usable(Evaluate(sensor, slots)).ToRationalFunction(),
        HeldPlantAndSensor(slots).Denominator);

    /// <summary>G·H formed in s (nothing cancelled), for the hold-accuracy estimate.</summary>
    public RationalFunction PlantAndSensor(double[] slots) =>
        Usable(Fraction.Multiply(plant.Evaluate(slots), Evaluate(sensor, slots))).ToRationalFunction();

    private Fraction HeldPlantAndSensor(double[] slots) =>
        Hold(Usable(Fraction.Multiply(plant.Evaluate(slots), Evaluate(sensor, slots))));

    // A gain p^a in the numerator of G·H and p^b in its denominator (1/J style) pass through the hold unchanged:
    // (p^a·N/(p^b·D))_τ = p^{a−b}·(N/D)_τ. Any other dependence on p is not rational in p after the hold.
    private SweptFraction? SweptHeld(double[] slots, int swept)
    {
        var g = EvaluateSwept(plant, slots, swept);
        var h = EvaluateSwept(sensor, slots, swept);
        if (g is null || h is null)
        {
            return null;
        }

        var gh = SweptFraction.Multiply(g, h);
        if (!IsMonomialInP(gh.Numerator, out int a) || !IsMonomialInP(gh.Denominator, out int b))
        {
            return null;
        }

        var held = Hold(new Fraction(gh.Numerator.CoefficientOfP(a), gh.Denominator.CoefficientOfP(b)));
        return new SweptFraction(SweptConstants.Of(held.Numerator, a), SweptConstants.Of(held.Denominator, b));
    }

    private static bool IsMonomialInP(BivariatePolynomial q, out int power)
    {
        power = q.CommonPowerOfP();
        return !q.IsZero && q.DegreeInP == power && q.AllFinite();
    }

    private Fraction Hold(Fraction continuous)
    {
        var g = continuous.ToRationalFunction();
        if (ZeroOrderHold.TryDiscretise(g, sampleTime, delay, out var held, out string? error))
        {
            return new Fraction(held.Numerator, held.Denominator);
        }

        string message = g.Numerator.Degree > g.Denominator.Degree
            ? "with sample_time set, plant*sensor must be proper (numerator degree at most the denominator's) to be held and sampled"
            : $"plant*sensor cannot be held and sampled for these parameter values: {error}";
        throw new PlantFileException(Blame.ErrorAt(0, message));
    }

    private Fraction Usable(Fraction f) =>
        f.IsUsable
            ? f
            : throw new PlantFileException(Blame.ErrorAt(0, "plant*sensor is not finite for these parameter values"));
}
