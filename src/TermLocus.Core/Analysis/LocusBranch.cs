using System.Collections.Immutable;

namespace TermLocus.Core.Analysis;

/// <summary>
/// One continuous branch of a root locus: a polyline of poles ordered by increasing swept value.
/// Consecutive points belong to the same pole (matched by least total squared movement).
/// </summary>
/// <param name="Points">The points, at least one, ordered by increasing <see cref="LocusPoint.Value"/>.</param>
/// <param name="Start">Why the branch starts at its first point.</param>
/// <param name="End">Why the branch ends at its last point.</param>
public sealed record LocusBranch(ImmutableArray<LocusPoint> Points, LocusBranchEnd Start, LocusBranchEnd End)
{
    /// <summary>The first point (lowest swept value).</summary>
    public LocusPoint First => Points[0];

    /// <summary>The last point (highest swept value).</summary>
    public LocusPoint Last => Points[^1];
}
