namespace TermLocus.Core.Plants;

/// <summary>Finds the known name closest to a misspelt one, for "did you mean" hints.</summary>
internal static class KeySuggestion
{
    /// <summary>Largest edit distance still offered as a suggestion.</summary>
    public const int MaxDistance = 2;

    /// <summary>The closest of <paramref name="known"/> to <paramref name="typed"/>, or null when none is close.</summary>
    /// <remarks>Close means equal ignoring case, or an edit distance (insert, delete, substitute, swap of
    /// neighbours) of at most 1 for names up to 4 characters and <see cref="MaxDistance"/> for longer ones.</remarks>
    public static string? Closest(string typed, IEnumerable<string> known)
    {
        string? best = null;
        var bestDistance = int.MaxValue;
        foreach (var candidate in known)
        {
            var distance = string.Equals(candidate, typed, StringComparison.OrdinalIgnoreCase) ? 0 : Distance(typed, candidate);
            if (distance < bestDistance)
            {
                best = candidate;
                bestDistance = distance;
            }
        }

        var limit = typed.Length <= 1 ? 0 : typed.Length <= 4 ? 1 : MaxDistance;
        return bestDistance <= limit && best != typed ? best : null;
    }

    /// <summary>" (did you mean 'x'?)" or an empty string.</summary>
    public static string Hint(string typed, IEnumerable<string> known, string open = "'", string close = "'")
    {
        var closest = Closest(typed, known);
        return closest is null ? string.Empty : $" (did you mean {open}{closest}{close}?)";
    }

    // Optimal string alignment distance: Levenshtein plus transposition of adjacent characters.
    private static int Distance(string a, string b)
    {
        var d = new int[a.Length + 1, b.Length + 1];
        for (var i = 0; i <= a.Length; i++)
        {
            d[i, 0] = i;
        }

        for (var j = 0; j <= b.Length; j++)
        {
            d[0, j] = j;
        }

        for (var i = 1; i <= a.Length; i++)
        {
            for (var j = 1; j <= b.Length; j++)
            {
                var cost = a[i - 1] == b[j - 1] ? 0 : 1;
                d[i, j] = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + cost);
                if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1])
                {
                    d[i, j] = Math.Min(d[i, j], d[i - 2, j - 2] + 1);
                }
            }
        }

        return d[a.Length, b.Length];
    }
}
