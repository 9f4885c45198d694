using System.Collections.Frozen;

namespace TermLocus.Core.Plants;

/// <summary>Rules for parameter names: identifiers that expressions can use, never a reserved word.</summary>
internal static class PlantNames
{
    /// <summary>Names the expression language keeps for itself: the Laplace and z variables, a constant and functions.</summary>
    public static readonly FrozenSet<string> Reserved = ReservedInOrder().ToFrozenSet(StringComparer.Ordinal);

    /// <summary>True when <paramref name="name"/> matches <c>[A-Za-z_][A-Za-z0-9_]*</c>.</summary>
    public static bool IsIdentifier(string name)
    {
        if (name.Length == 0 || char.IsAsciiDigit(name[0]))
        {
            return false;
        }

        foreach (var c in name)
        {
            if (!char.IsAsciiLetterOrDigit(c) && c != '_')
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>Why <paramref name="name"/> cannot name a parameter, or null when it can.</summary>
    public static string? Problem(string name)
    {
        if (!IsIdentifier(name))
        {
            return $"'{PlantTextSafety.Visible(name)}' is not a valid parameter name: use letters, digits and _, not starting with a digit";
        }

        return Reserved.Contains(name)
            ? $"'{name}' is reserved ({string.Join(", ", ReservedInOrder())}); choose another parameter name"
            : null;
    }

    private static string[] ReservedInOrder() => ["s", "z", "pi", "sqrt", "exp", "ln", "abs"];
}
