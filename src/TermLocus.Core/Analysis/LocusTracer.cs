using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Traces root loci: the closed-loop poles of a <see cref="CharacteristicFamily"/> as the swept parameter moves,
/// as continuous branches fine enough to draw.
/// </summary>
public static class LocusTracer
{
    /// <summary>
    /// Traces the locus over [<paramref name="from"/>, <paramref name="to"/>] (any signs). Poles are paired from one
    /// value to the next by least total squared movement; segments are halved until no pole jumps more than
    /// <see cref="LocusTrace.AllowedStep"/> or the value cap is reached. At values where P(s; p) drops in degree the
    /// branches are cut (a pole passes through infinity) and new ones start after them; see <see cref="LocusBranchEnd"/>.
    /// Throws <see cref="ArgumentException"/> when the range is not finite or from &gt;= to, and
    /// <see cref="ArgumentOutOfRangeException"/> for invalid options. A family of degree 0 gives no branches.
    /// </summary>
    public static LocusTrace Trace(CharacteristicFamily family, double from, double to, TraceOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(family);
        options ??= TraceOptions.Default;
        options.Validate();
        if (!double.IsFinite(from) || !double.IsFinite(to) || from >= to)
        {
            throw new ArgumentException($"The traced range must be finite with from < to (got {from}, {to}).");
        }

        var drops = TraceDegreeDrops.Find(family, from, to);
        double scale = options.Scale ?? TraceScale.Default(family, from, to);
        int degree = drops.NominalDegree;
        if (degree < 1)
        {
            return new LocusTrace(from, to, scale, options.MaxStepFraction, [], drops.Values, 0, true);
        }

        var warp = TraceParameterWarp.For(family, from, to, options.MaxStepFraction * scale);
        var coefficients = new TraceCoefficients(family);
        var budget = new TraceBudget(options.MaxValues);
        var branches = ImmutableArray.CreateBuilder<LocusBranch>();
        bool complete = true;
        foreach (var raw in TracePieces.Split(from, to, drops.Values))
        {
            if (TracePieces.Trim(raw, coefficients, degree, warp, scale, options.FarLimit) is { } piece)
            {
                var refiner = new TracePieceRefiner(coefficients, warp, degree, scale, options.MaxStepFraction, budget);
                complete &= TracePiece(refiner, piece, warp, from, to, options.InitialIntervals, branches);
            }
        }

        return new LocusTrace(from, to, scale, options.MaxStepFraction, branches.ToImmutable(), drops.Values,
            budget.Used, complete);
    }

    /// <summary>Traces one piece with its share of the initial intervals; adds its branches, returns completeness.</summary>
    private static bool TracePiece(TracePieceRefiner refiner, TracePieces.Piece piece, TraceParameterWarp warp,
        double from, double to, int initialIntervals, ImmutableArray<LocusBranch>.Builder branches)
    {
        double share = (warp.ToWarped(piece.To) - warp.ToWarped(piece.From)) / (warp.ToWarped(to) - warp.ToWarped(from));
        int intervals = Math.Max(4, (int)Math.Ceiling(initialIntervals * share));
        var (points, complete) = refiner.Run(piece.From, piece.To, intervals);
        var start = piece.FromDrop ? LocusBranchEnd.DegreeDrop : LocusBranchEnd.RangeLimit;
        var end = piece.ToDrop ? LocusBranchEnd.DegreeDrop : LocusBranchEnd.RangeLimit;
        branches.AddRange(points.Select(p => new LocusBranch(p, start, end)));
        return complete;
    }

    /// <summary>
    /// The closed-loop poles at swept value <paramref name="p"/>: the roots of P(s; p), sorted by real part then
    /// imaginary part; empty when P is a non-zero constant. Throws <see cref="ArgumentException"/> when P(s; p) is
    /// the zero polynomial (every s is a root) or has a coefficient that is not finite, and
    /// <see cref="ArithmeticException"/> when the root solver does not converge.
    /// </summary>
    public static ImmutableArray<Complex> PolesAt(CharacteristicFamily family, double p)
    {
        ArgumentNullException.ThrowIfNull(family);
        return [.. PolynomialRoots.Find(family.At(p))];
    }

    /// <summary>
    /// A range [0, b] for a parameter that has none: b lies past the last imaginary-axis crossing and break point
    /// (at least twice the largest such value, ignoring values over a million times the next figure) and far enough that the
    /// poles heading for infinity are <paramref name="farFactor"/> times the spread of the open-loop poles and zeros
    /// from their centroid (or, for families that are not affine, of the poles at 0 from their mean).
    /// <paramref name="farFactor"/> must be above 1 (default 5); throws <see cref="ArgumentOutOfRangeException"/> otherwise.
    /// </summary>
    public static Interval AutomaticRange(CharacteristicFamily family, double farFactor = 5.0)
    {
        ArgumentNullException.ThrowIfNull(family);
        if (!(farFactor > 1.0 && double.IsFinite(farFactor)))
        {
            throw new ArgumentOutOfRangeException(nameof(farFactor), farFactor, "Must be finite and above 1.");
        }

        return new Interval(0.0, LocusAutomaticRange.UpperBound(family, farFactor));
    }
}
