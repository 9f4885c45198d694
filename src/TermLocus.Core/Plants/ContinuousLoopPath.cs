using TermLocus.Core.Algebra;
using TermLocus.Core.Expressions;

namespace TermLocus.Core.Plants;

/// <summary>
/// A continuous loop in s: factors controller C, plant G, sensor H and, with a transport delay, its Padé
/// approximant P_d (fixed: the delay is a number, not a parameter). Reference to output C·G·P_d / (1 ± C·G·H·P_d):
/// the delay stands in the forward path, between controller and plant output.
/// </summary>
internal sealed class ContinuousLoopPath : LoopPath
{
    private readonly LoopExpression?[] parts;
    private readonly Fraction? delay;

    /// <param name="controller">C, or null for 1.</param>
    /// <param name="plant">G.</param>
    /// <param name="sensor">H, or null for 1.</param>
    /// <param name="delay">The Padé approximant of the delay as a fraction in s, or null for no delay.</param>
    public ContinuousLoopPath(LoopExpression? controller, LoopExpression plant, LoopExpression? sensor, RationalFunction? delay)
        : base(plant.Parsed)
    {
        parts = [controller, plant, sensor];
        this.delay = delay is null ? null : new Fraction(delay.Numerator, delay.Denominator);
    }

    public override Fraction[] Factors(double[] slots) => WithDelay(parts.Select(p => Evaluate(p, slots)));

    public override Polynomial ReferenceNumerator(double[] slots, Fraction[] factors)
    {
        var numerator = factors[0].Numerator * factors[1].Numerator * factors[2].Denominator;
        return delay is { } d ? numerator * d.Numerator : numerator;
    }

    public override SweptFraction[]? SweptFactors(double[] slots, int swept)
    {
        var result = new List<SweptFraction>();
        foreach (var part in parts)
        {
            if (EvaluateSwept(part, slots, swept) is not { } value)
            {
                return null;
            }

            result.Add(value);
        }

        if (delay is { } d)
        {
            result.Add(SweptConstants.Of(d));
        }

        return [.. result];
    }

    public override Func<double, Fraction[]> FactorFamily(double[] slots, int swept)
    {
        var fixedParts = parts.Select(p => p is not null && p.Uses(swept) ? (Fraction?)null : Evaluate(p, slots)).ToArray();
        return p =>
        {
            var v = With(slots, swept, p);
            return WithDelay(parts.Select((part, i) => fixedParts[i] ?? Evaluate(part, v)));
        };
    }

    public override Fraction[] CancellableFactors(Fraction[] factors) => factors[..3];

    /// <summary>Forward path C·G and feedback path H, without the delay, for the exact delayed response.</summary>
    public (RationalFunction Forward, RationalFunction Feedback) DelayFreePaths(double[] slots)
    {
        var f = parts.Select(p => Evaluate(p, slots)).ToArray();
        var forward = Fraction.Multiply(f[0], f[1]);
        return (forward.ToRationalFunction(), f[2].ToRationalFunction());
    }

    private Fraction[] WithDelay(IEnumerable<Fraction> factors) =>
        delay is { } d ? [.. factors, d] : [.. factors];
}
