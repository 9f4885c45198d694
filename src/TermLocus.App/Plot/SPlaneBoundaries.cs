using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Plants;

namespace TermLocus.App.Plot;

/// <summary>
/// Spec limits of the s-plane as polylines. Lines are built out to a <c>reach</c> (a distance from the origin,
/// e.g. <see cref="PlaneRect.Reach"/> of the view) and clipped when drawn.
/// </summary>
public static class SPlaneBoundaries
{
    /// <summary>
    /// The constant-damping lines ζ = <paramref name="damping"/>: two rays from the origin at ±acos ζ from the
    /// negative real axis, drawn as one polyline upper end → origin → lower end. For ζ &gt; 0 they open into the left
    /// half-plane; poles between them (towards the negative real axis) are better damped.
    /// </summary>
    /// <param name="damping">ζ in [-1, 1].</param>
    /// <param name="reach">Length of each ray, &gt; 0.</param>
    public static BoundaryCurve Damping(double damping, double reach)
    {
        if (!(damping >= -1 && damping <= 1))
        {
            throw new ArgumentOutOfRangeException(nameof(damping), damping, "damping ratio must be in [-1, 1]");
        }

        CheckReach(reach);
        double across = Math.Sqrt(1 - (damping * damping));
        var upper = new Complex(-damping * reach, across * reach);
        return new BoundaryCurve(BoundaryKind.Damping, [upper, Complex.Zero, Complex.Conjugate(upper)]);
    }

    /// <summary>The decay-rate limit Re(s) = −<paramref name="decayRate"/>: a vertical line from −reach·j to +reach·j.</summary>
    /// <param name="decayRate">σ in 1/s, finite.</param>
    /// <param name="reach">Half length of the line, &gt; 0.</param>
    public static BoundaryCurve DecayRate(double decayRate, double reach)
    {
        if (!double.IsFinite(decayRate))
        {
            throw new ArgumentOutOfRangeException(nameof(decayRate), decayRate, "decay rate must be finite");
        }

        CheckReach(reach);
        return new BoundaryCurve(
            BoundaryKind.DecayRate, [new Complex(-decayRate, -reach), new Complex(-decayRate, reach)]);
    }

    /// <summary>The natural-frequency limit |s| = <paramref name="naturalFrequency"/>, left half-plane half circle
    /// from +jωn through −ωn to −jωn.</summary>
    /// <param name="naturalFrequency">ωn in rad/s, &gt;= 0.</param>
    public static BoundaryCurve NaturalFrequency(double naturalFrequency) =>
        new(BoundaryKind.NaturalFrequency, PlaneCurves.Arc(Complex.Zero, naturalFrequency, Math.PI / 2, 3 * Math.PI / 2));

    /// <summary>
    /// Every limit of <paramref name="specs"/> that has a shape in the s-plane: the ζ lines, one decay-rate line
    /// at the strictest of the minimum decay rate, ln 2 / longest time to half and 4 / longest settling time, and the
    /// ωn arcs. Overshoot is a time-response limit and has no line.
    /// </summary>
    public static ImmutableArray<BoundaryCurve> FromSpecs(Specs specs, double reach)
    {
        ArgumentNullException.ThrowIfNull(specs);
        var boundaries = ImmutableArray.CreateBuilder<BoundaryCurve>();
        if (specs.MinDamping is double zeta)
        {
            boundaries.Add(Damping(Math.Clamp(zeta, -1, 1), reach));
        }

        if (StrictestDecayRate(specs) is double sigma)
        {
            boundaries.Add(DecayRate(sigma, reach));
        }

        foreach (double? wn in new[] { specs.MinNaturalFrequency, specs.MaxNaturalFrequency })
        {
            if (wn is double radius && radius >= 0)
            {
                boundaries.Add(NaturalFrequency(radius));
            }
        }

        return boundaries.ToImmutable();
    }

    /// <summary>The largest decay rate (1/s) implied by the decay-rate, time-to-half (σ = ln 2 / t) and 2 % settling
    /// time (σ ≈ 4 / t) limits, or null when none is set.</summary>
    public static double? StrictestDecayRate(Specs specs)
    {
        ArgumentNullException.ThrowIfNull(specs);
        double? strictest = specs.MinDecayRate;
        if (specs.MaxTimeToHalfSeconds is double half && half > 0)
        {
            strictest = Math.Max(strictest ?? double.NegativeInfinity, Math.Log(2) / half);
        }

        if (specs.MaxSettlingTimeSeconds is double settle && settle > 0)
        {
            strictest = Math.Max(strictest ?? double.NegativeInfinity, 4 / settle);
        }

        return strictest;
    }

    private static void CheckReach(double reach)
    {
        if (!(reach > 0) || double.IsInfinity(reach))
        {
            throw new ArgumentOutOfRangeException(nameof(reach), reach, "reach must be positive and finite");
        }
    }
}
