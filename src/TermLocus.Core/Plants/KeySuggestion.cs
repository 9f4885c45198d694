namespace TermLocus.Core.Plants;

/// <summary>Formats "did you mean" hints for misspelt keys and names (the matching is <see cref="NameSuggestion"/>'s).</summary>
internal static class KeySuggestion
{
    /// <summary>" (did you mean 'x'?)" when a known name is close to <paramref name="typed"/>, else an empty string.</summary>
    public static string Hint(string typed, IEnumerable<string> known, string open = "'", string close = "'")
    {
        var closest = NameSuggestion.Closest(typed, known);
        return closest is null || closest == typed ? string.Empty : $" (did you mean {open}{closest}{close}?)";
    }
}
