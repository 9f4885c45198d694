using System.Collections.Immutable;

namespace TermLocus.Core.Analysis;

/// <summary>A closed interval [From, To] of the swept parameter where every spec holds at every point of the band.</summary>
/// <param name="From">Lower end, in the swept parameter's unit (solved, or the span's start).</param>
/// <param name="To">Upper end (solved, or the span's end); To &gt;= From.</param>
/// <param name="LimitedBy">Spec keys that become violated just outside each end (lower end's first), deduplicated.</param>
public sealed record FeasibleInterval(double From, double To, ImmutableArray<string> LimitedBy)
{
    /// <summary>To - From.</summary>
    public double Width => To - From;

    /// <summary>The keys violated just below <see cref="From"/>; empty when it is the span's start (or not known).</summary>
    public ImmutableArray<string> FromLimitedBy { get; init; } = [];

    /// <summary>The keys violated just above <see cref="To"/>; empty when it is the span's end (or not known).</summary>
    public ImmutableArray<string> ToLimitedBy { get; init; } = [];
}
