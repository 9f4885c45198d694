namespace TermLocus.Core.Plants;

/// <summary>Finds the known name a mistyped one was most likely meant to be.</summary>
internal static class NameSuggestion
{
    private const int MaxEdits = 2;

    /// <summary>
    /// The known name with the fewest single-character edits from <paramref name="name"/> (ignoring case), if at most
    /// two edits and fewer than the name's length; ties go to the first in <paramref name="known"/>. Null otherwise.
    /// </summary>
    public static string? Closest(string name, IEnumerable<string> known)
    {
        string? best = null;
        int bestDistance = int.MaxValue;
        foreach (string candidate in known)
        {
            int d = Distance(name.ToUpperInvariant(), candidate.ToUpperInvariant());
            if (d < bestDistance)
            {
                best = candidate;
                bestDistance = d;
            }
        }

        return bestDistance <= MaxEdits && bestDistance < name.Length ? best : null;
    }

    // Levenshtein distance, stopped early once it cannot come under the limit (names in files can be long).
    private static int Distance(string a, string b)
    {
        if (Math.Abs(a.Length - b.Length) > MaxEdits)
        {
            return int.MaxValue;
        }

        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (int j = 0; j <= b.Length; j++)
        {
            previous[j] = j;
        }

        for (int i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (int j = 1; j <= b.Length; j++)
            {
                int substitute = previous[j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1);
                current[j] = Math.Min(substitute, Math.Min(previous[j], current[j - 1]) + 1);
            }

            (previous, current) = (current, previous);
        }

        return previous[b.Length];
    }
}
