using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Checks closed-loop poles against the pole-placement limits of a <see cref="Specs"/>. Every limit applies to every
/// pole. Per pole s (σ = -Re s, ωn = |s|, ζ = σ/ωn), the margin (positive inside the spec, in the spec's unit) is:
/// <list type="bullet">
/// <item><c>min_damping</c> L: ζ - L. A pole at the origin has no ζ (reported actual null); it does not decay, so it is
/// checked as ζ = 0, the value on the imaginary axis it sits on: margin -L.</item>
/// <item><c>min_decay_rate</c> L: σ - L (1/s).</item>
/// <item><c>max_time_to_half</c> T: T - ln2/σ (s) when σ &gt; 0; a pole with σ &lt;= 0 never halves: actual null,
/// margin minus infinity.</item>
/// <item><c>max_settling_time</c> Ts: Ts - 4/σ (s), the 2 % envelope estimate; σ &lt;= 0 as for time to half.</item>
/// <item><c>min_natural_frequency</c> L: ωn - L; <c>max_natural_frequency</c> L: L - ωn (rad/s).</item>
/// </list>
/// A pole violates a limit when its margin is negative; one exactly on the limit meets it.
/// <c>max_overshoot_pct</c> is not a pole property and is ignored here.
/// </summary>
public static class SpecCheck
{
    /// <summary>The report for <paramref name="poles"/> (rad/s, any order) against every limit present in <paramref name="specs"/>.</summary>
    /// <exception cref="ArgumentException">A pole or a limit is not finite.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A time limit is not positive.</exception>
    public static SpecReport Evaluate(Specs specs, IReadOnlyList<Complex> poles)
    {
        ArgumentNullException.ThrowIfNull(specs);
        ArgumentNullException.ThrowIfNull(poles);
        var limits = Limits(specs);
        foreach (var pole in poles)
        {
            if (!double.IsFinite(pole.Real) || !double.IsFinite(pole.Imaginary))
            {
                throw new ArgumentException("Every pole must be finite.", nameof(poles));
            }
        }

        var metrics = poles.Select(PoleMetrics.Of).ToArray();
        var outcomes = ImmutableArray.CreateBuilder<SpecOutcome>();
        var violations = ImmutableArray.CreateBuilder<SpecViolation>();
        foreach (var (kind, limit) in limits)
        {
            if (metrics.Length == 0)
            {
                break;
            }

            outcomes.Add(Outcome(kind, limit, metrics));
            violations.AddRange(ViolationsOf(kind, limit, metrics, poles));
        }

        return new SpecReport(outcomes.ToImmutable(), violations.ToImmutable());
    }

    /// <summary>
    /// The decay rate σ (1/s) every pole needs to meet all three decay-type limits at once: the largest of
    /// <c>min_decay_rate</c>, ln2/<c>max_time_to_half</c> and 4/<c>max_settling_time</c>; null when none is set.
    /// The vertical line Re(s) = -σ is the boundary the s-plane view draws.
    /// </summary>
    /// <exception cref="ArgumentException">A limit is not finite.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A time limit is not positive.</exception>
    public static double? RequiredDecayRate(Specs specs)
    {
        double? required = null;
        foreach (var (kind, limit) in Limits(specs))
        {
            if (kind is SpecKind.MinDecayRate or SpecKind.MaxTimeToHalf or SpecKind.MaxSettlingTime)
            {
                double sigma = EquivalentDecayRate(kind, limit);
                required = required is null ? sigma : Math.Max(required.Value, sigma);
            }
        }

        return required;
    }

    /// <summary>
    /// The decay rate σ (1/s) equivalent to one decay-type limit: the limit itself for <c>min_decay_rate</c>,
    /// ln2/T for <c>max_time_to_half</c> T (s), 4/Ts for <c>max_settling_time</c> Ts (s).
    /// </summary>
    /// <exception cref="ArgumentException"><paramref name="kind"/> is not a decay-type limit.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A time limit is not positive and finite.</exception>
    public static double EquivalentDecayRate(SpecKind kind, double limit)
    {
        if (kind is SpecKind.MaxTimeToHalf or SpecKind.MaxSettlingTime && !(limit > 0.0 && double.IsFinite(limit)))
        {
            throw new ArgumentOutOfRangeException(nameof(limit), limit, "A time limit must be positive and finite.");
        }

        return kind switch
        {
            SpecKind.MinDecayRate => limit,
            SpecKind.MaxTimeToHalf => Math.Log(2.0) / limit,
            SpecKind.MaxSettlingTime => 4.0 / limit,
            _ => throw new ArgumentException($"{kind.Key()} is not a decay-rate limit.", nameof(kind)),
        };
    }

    /// <summary>The limits present in <paramref name="specs"/>, in <see cref="SpecKind"/> order, validated.</summary>
    /// <exception cref="ArgumentException">A limit is not finite.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A time limit is not positive.</exception>
    public static IReadOnlyList<(SpecKind Spec, double Limit)> Limits(Specs specs)
    {
        ArgumentNullException.ThrowIfNull(specs);
        var list = new List<(SpecKind, double)>(6);
        Add(list, SpecKind.MinDamping, specs.MinDamping);
        Add(list, SpecKind.MinDecayRate, specs.MinDecayRate);
        Add(list, SpecKind.MaxTimeToHalf, specs.MaxTimeToHalfSeconds);
        Add(list, SpecKind.MaxSettlingTime, specs.MaxSettlingTimeSeconds);
        Add(list, SpecKind.MinNaturalFrequency, specs.MinNaturalFrequency);
        Add(list, SpecKind.MaxNaturalFrequency, specs.MaxNaturalFrequency);
        return list;
    }

    /// <summary>The margin and actual value of one pole against one limit, as defined on <see cref="SpecCheck"/>.</summary>
    public static (double Margin, double? Actual) Measure(SpecKind kind, double limit, PoleMetrics pole)
    {
        ArgumentNullException.ThrowIfNull(pole);
        double sigma = pole.DecayRate;
        return kind switch
        {
            SpecKind.MinDamping => ((pole.Damping ?? 0.0) - limit, pole.Damping),
            SpecKind.MinDecayRate => (sigma - limit, sigma),
            SpecKind.MaxTimeToHalf => sigma > 0 ? (limit - pole.TimeToHalfSeconds!.Value, pole.TimeToHalfSeconds) : (double.NegativeInfinity, null),
            SpecKind.MaxSettlingTime => sigma > 0 ? (limit - pole.SettlingTime2PctSeconds!.Value, pole.SettlingTime2PctSeconds) : (double.NegativeInfinity, null),
            SpecKind.MinNaturalFrequency => (pole.NaturalFrequency - limit, pole.NaturalFrequency),
            SpecKind.MaxNaturalFrequency => (limit - pole.NaturalFrequency, pole.NaturalFrequency),
            _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "Unknown spec kind."),
        };
    }

    private static void Add(List<(SpecKind, double)> list, SpecKind kind, double? limit)
    {
        if (limit is not double value)
        {
            return;
        }

        if (!double.IsFinite(value))
        {
            throw new ArgumentException($"{kind.Key()} must be finite.", nameof(limit));
        }

        if (kind is SpecKind.MaxTimeToHalf or SpecKind.MaxSettlingTime && value <= 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(limit), value, $"{kind.Key()} must be positive.");
        }

        list.Add((kind, value));
    }

    private static SpecOutcome Outcome(SpecKind kind, double limit, PoleMetrics[] metrics)
    {
        int worst = 0;
        var (worstMargin, worstActual) = Measure(kind, limit, metrics[0]);
        for (int i = 1; i < metrics.Length; i++)
        {
            var (margin, actual) = Measure(kind, limit, metrics[i]);
            bool upperTwin = margin == worstMargin && metrics[i].Pole.Imaginary > metrics[worst].Pole.Imaginary;
            if (margin < worstMargin || upperTwin)
            {
                (worst, worstMargin, worstActual) = (i, margin, actual);
            }
        }

        double relative = limit == 0.0 ? worstMargin : worstMargin / Math.Abs(limit);
        return new SpecOutcome(kind, limit, worstActual, worstMargin, relative, metrics[worst].Pole);
    }

    private static IEnumerable<SpecViolation> ViolationsOf(SpecKind kind, double limit, PoleMetrics[] metrics, IReadOnlyList<Complex> poles)
    {
        var found = new List<SpecViolation>();
        foreach (var m in metrics)
        {
            bool listedByTwin = m.Pole.Imaginary < 0 && poles.Contains(Complex.Conjugate(m.Pole));
            var (margin, actual) = Measure(kind, limit, m);
            if (margin < 0.0 && !listedByTwin)
            {
                found.Add(new SpecViolation(kind, limit, actual, margin, m.Pole));
            }
        }

        return found.OrderBy(v => v.Margin);
    }
}
