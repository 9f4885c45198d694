using System.Collections.Immutable;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Splits a traced range at the values where P(s; p) drops in degree, and pulls each piece's ends back from such
/// values to where the poles heading for infinity reach the far limit, so no branch ever holds a point "at infinity".
/// </summary>
internal static class TracePieces
{
    private const int MaxHalvings = 60;
    private const int Bisections = 24;

    /// <summary>A piece [From, To] and whether each end lies next to a degree drop.</summary>
    internal readonly record struct Piece(double From, double To, bool FromDrop, bool ToDrop);

    internal static ImmutableArray<Piece> Split(double from, double to, ImmutableArray<double> drops)
    {
        var cuts = new List<double> { from };
        cuts.AddRange(drops.Where(d => d > from && d < to));
        cuts.Add(to);
        var pieces = ImmutableArray.CreateBuilder<Piece>();
        for (int i = 0; i + 1 < cuts.Count; i++)
        {
            bool fromDrop = drops.Contains(cuts[i]);
            bool toDrop = drops.Contains(cuts[i + 1]);
            pieces.Add(new Piece(cuts[i], cuts[i + 1], fromDrop, toDrop));
        }

        return pieces.ToImmutable();
    }

    /// <summary>
    /// The piece with drop ends moved inward to where the largest pole magnitude equals
    /// <c>farLimit × max(scale, largest magnitude at the piece's other end)</c>; null when nothing of it is left.
    /// </summary>
    internal static Piece? Trim(Piece piece, TraceCoefficients coefficients, int degree, TraceParameterWarp warp,
        double scale, double farLimit)
    {
        double u0 = warp.ToWarped(piece.From), u1 = warp.ToWarped(piece.To);
        double reference = LargestPole(coefficients, degree, ReferenceValue(piece, warp));
        double limit = farLimit * Math.Max(scale, double.IsFinite(reference) ? reference : 0.0);
        double from = piece.From, to = piece.To;
        if (piece.FromDrop)
        {
            from = warp.ToValue(PullBack(u0, u1, coefficients, degree, warp, limit));
        }

        if (piece.ToDrop)
        {
            to = warp.ToValue(PullBack(u1, u0, coefficients, degree, warp, limit));
        }

        return from < to ? piece with { From = from, To = to } : null;
    }

    /// <summary>Where the poles are of ordinary size: the end that is not a drop, else the middle.</summary>
    private static double ReferenceValue(Piece piece, TraceParameterWarp warp) =>
        !piece.ToDrop ? piece.To
        : !piece.FromDrop ? piece.From
        : warp.ToValue(0.5 * (warp.ToWarped(piece.From) + warp.ToWarped(piece.To)));

    /// <summary>The warped value between uDrop and uOther, nearest uDrop, where poles stay within the limit.</summary>
    private static double PullBack(double uDrop, double uOther, TraceCoefficients coefficients, int degree,
        TraceParameterWarp warp, double limit)
    {
        bool Within(double t) => LargestPole(coefficients, degree, warp.ToValue(uDrop + (t * (uOther - uDrop)))) <= limit;

        double inside = 1.0;
        for (int j = 1; j <= MaxHalvings; j++)
        {
            double t = Math.ScaleB(1.0, -j);
            if (!Within(t))
            {
                double outside = t;
                for (int k = 0; k < Bisections; k++)
                {
                    double m = 0.5 * (inside + outside);
                    if (Within(m))
                    {
                        inside = m;
                    }
                    else
                    {
                        outside = m;
                    }
                }

                return uDrop + (inside * (uOther - uDrop));
            }

            inside = t;
        }

        return uDrop + (inside * (uOther - uDrop));
    }

    /// <summary>Largest pole magnitude at p, or +∞ when P(s; p) is not of the piece's degree there.</summary>
    private static double LargestPole(TraceCoefficients coefficients, int degree, double p)
    {
        var poly = coefficients.At(p);
        return poly.Degree == degree ? TraceScale.LargestRoot(poly) : double.PositiveInfinity;
    }
}
