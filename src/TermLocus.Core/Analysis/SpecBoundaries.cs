using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The swept values where any closed-loop pole crosses a spec limit's boundary: the ζ lines, the decay-rate line,
/// the natural-frequency circles. Each boundary is the zero set of a function h(s) that is continuous everywhere
/// (also at the origin, where ζ itself is undefined) and non-negative on the allowed side:
/// ζ: −Re s − ζmin·|s|; σ: −Re s − σmin; ωn,min: |s| − ωmin; ωn,max: ωmax − |s|.
/// Sign changes of h along the traced branches are refined by Brent's method to at least 1e-9 relative.
/// A sign change of the ζ function at the origin (a real pole changing half-plane, where ζ is undefined) is a
/// stability crossing, not a damping boundary, and is left out; the σ and ωn boundaries are defined there and kept.
/// </summary>
public static class SpecBoundaries
{
    /// <summary>
    /// A crossing pole within this share of the trace's scale of the origin is at the origin: the crossing value is
    /// solved to machine precision, so such a pole sits there up to rounding (3.5e-14 against poles of 3000 rad/s
    /// in the magnetic-bearing demo).
    /// </summary>
    public const double OriginShare = 1e-9;

    /// <summary>
    /// Traces [<paramref name="from"/>, <paramref name="to"/>] and finds every boundary crossing for the limits given
    /// (null limits are skipped). <paramref name="minDamping"/> in (-1, 1]; <paramref name="minDecayRate"/> finite, 1/s;
    /// natural frequencies finite and &gt;= 0, rad/s. Throws <see cref="ArgumentOutOfRangeException"/> for a limit out
    /// of range and <see cref="ArgumentException"/> for a bad range. Results are ordered by value, then by kind.
    /// </summary>
    public static ImmutableArray<SpecBoundary> Find(CharacteristicFamily family, double from, double to,
        double? minDamping = null, double? minDecayRate = null, double? minNaturalFrequency = null,
        double? maxNaturalFrequency = null, TraceOptions? options = null)
    {
        Validate(minDamping, minDecayRate, minNaturalFrequency, maxNaturalFrequency);
        var trace = LocusTracer.Trace(family, from, to, options);
        return Find(family, trace, minDamping, minDecayRate, minNaturalFrequency, maxNaturalFrequency);
    }

    /// <summary>As the other overload, on an existing trace of <paramref name="family"/> (its range is used).</summary>
    public static ImmutableArray<SpecBoundary> Find(CharacteristicFamily family, LocusTrace trace,
        double? minDamping = null, double? minDecayRate = null, double? minNaturalFrequency = null,
        double? maxNaturalFrequency = null)
    {
        ArgumentNullException.ThrowIfNull(family);
        ArgumentNullException.ThrowIfNull(trace);
        Validate(minDamping, minDecayRate, minNaturalFrequency, maxNaturalFrequency);
        var found = new List<SpecBoundary>();
        if (minDamping is { } zeta)
        {
            // h changes sign at the origin too, where a real pole changes half-plane: that is the stability
            // crossing, reported as such, and ζ is undefined there, so it is no damping boundary.
            found.AddRange(Crossings(family, trace, SpecBoundaryKind.MinDamping, zeta, s => -s.Real - (zeta * s.Magnitude))
                .Where(b => b.Pole.Magnitude > OriginShare * trace.Scale));
        }

        if (minDecayRate is { } sigma)
        {
            found.AddRange(Crossings(family, trace, SpecBoundaryKind.MinDecayRate, sigma, s => -s.Real - sigma));
        }

        if (minNaturalFrequency is { } low)
        {
            found.AddRange(Crossings(family, trace, SpecBoundaryKind.MinNaturalFrequency, low, s => s.Magnitude - low));
        }

        if (maxNaturalFrequency is { } high)
        {
            found.AddRange(Crossings(family, trace, SpecBoundaryKind.MaxNaturalFrequency, high, s => high - s.Magnitude));
        }

        return [.. found.OrderBy(b => b.Value).ThenBy(b => b.Spec)];
    }

    private static IEnumerable<SpecBoundary> Crossings(CharacteristicFamily family, LocusTrace trace,
        SpecBoundaryKind kind, double limit, Func<Complex, double> h) =>
        TraceCrossingFinder.Find(family, trace, h).Select(c => new SpecBoundary(
            kind, limit, c.Value, c.Pole, c.Entering, [.. PolynomialRoots.Find(family.At(c.Value))]));

    private static void Validate(double? minDamping, double? minDecayRate, double? minNaturalFrequency,
        double? maxNaturalFrequency)
    {
        if (minDamping is { } z && !(z > -1.0 && z <= 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(minDamping), z, "Must be in (-1, 1].");
        }

        if (minDecayRate is { } s && !double.IsFinite(s))
        {
            throw new ArgumentOutOfRangeException(nameof(minDecayRate), s, "Must be finite.");
        }

        foreach (var (name, w) in new[] { (nameof(minNaturalFrequency), minNaturalFrequency), (nameof(maxNaturalFrequency), maxNaturalFrequency) })
        {
            if (w is { } v && !(v >= 0.0 && double.IsFinite(v)))
            {
                throw new ArgumentOutOfRangeException(name, v, "Must be finite and >= 0.");
            }
        }
    }
}
