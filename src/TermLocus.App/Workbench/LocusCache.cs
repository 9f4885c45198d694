using System.Collections.Immutable;

namespace TermLocus.App.Workbench;

/// <summary>
/// The last few locus analyses, by their inputs, so that going back to a set of values (a band corner, the nominal
/// values) does not trace again. Oldest entries drop out first.
/// </summary>
/// <param name="Entries">Newest last.</param>
public sealed record LocusCache(ImmutableArray<LocusAnalysis> Entries)
{
    /// <summary>Analyses kept.</summary>
    public const int Capacity = 24;

    /// <summary>An empty cache.</summary>
    public static LocusCache Empty { get; } = new(ImmutableArray<LocusAnalysis>.Empty);

    /// <summary>The analysis for <paramref name="key"/>, or null.</summary>
    public LocusAnalysis? Find(TraceKey key)
    {
        foreach (var entry in Entries)
        {
            if (entry.Key.Equals(key))
            {
                return entry;
            }
        }

        return null;
    }

    /// <summary>This cache with <paramref name="analysis"/> added (replacing one with the same key).</summary>
    public LocusCache With(LocusAnalysis analysis)
    {
        var kept = Entries.Where(e => !e.Key.Equals(analysis.Key)).ToList();
        kept.Add(analysis);
        return new LocusCache(kept.Skip(Math.Max(0, kept.Count - Capacity)).ToImmutableArray());
    }
}
