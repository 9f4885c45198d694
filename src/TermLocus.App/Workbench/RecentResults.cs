using System.Collections.Immutable;

namespace TermLocus.App.Workbench;

/// <summary>
/// The last results of a computation by their inputs, newest last, so stepping back to a value shows it at once.
/// Oldest entries drop out first.
/// </summary>
/// <typeparam name="TKey">The inputs (value equality).</typeparam>
/// <typeparam name="TResult">The result.</typeparam>
/// <param name="Entries">Newest last.</param>
public sealed record RecentResults<TKey, TResult>(ImmutableArray<KeyValuePair<TKey, TResult>> Entries)
    where TKey : notnull
{
    /// <summary>Results kept.</summary>
    public const int Capacity = 64;

    /// <summary>No results.</summary>
    public static RecentResults<TKey, TResult> Empty { get; } = new(ImmutableArray<KeyValuePair<TKey, TResult>>.Empty);

    /// <summary>The result for <paramref name="key"/>, or default.</summary>
    public TResult? Find(TKey key)
    {
        foreach (var entry in Entries)
        {
            if (EqualityComparer<TKey>.Default.Equals(entry.Key, key))
            {
                return entry.Value;
            }
        }

        return default;
    }

    /// <summary>These results with <paramref name="result"/> for <paramref name="key"/> added (replacing one with the same key).</summary>
    public RecentResults<TKey, TResult> With(TKey key, TResult result)
    {
        var kept = Entries.Where(e => !EqualityComparer<TKey>.Default.Equals(e.Key, key)).ToList();
        kept.Add(new KeyValuePair<TKey, TResult>(key, result));
        return new RecentResults<TKey, TResult>(kept.Skip(Math.Max(0, kept.Count - Capacity)).ToImmutableArray());
    }
}
