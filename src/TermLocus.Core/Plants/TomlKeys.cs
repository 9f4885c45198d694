using Tomlyn.Syntax;

namespace TermLocus.Core.Plants;

/// <summary>Reads key names out of Tomlyn key syntax (bare, quoted and dotted keys).</summary>
internal static class TomlKeys
{
    /// <summary>The name of one key part: a bare key's text or a quoted key's decoded value.</summary>
    public static string PartName(BareKeyOrStringValueSyntax? part) => part switch
    {
        BareKeySyntax bare => bare.Key?.Text ?? string.Empty,
        StringValueSyntax quoted => quoted.Value ?? string.Empty,
        _ => string.Empty,
    };

    /// <summary>True when the key has more than one part (<c>a.b</c>).</summary>
    public static bool IsDotted(KeySyntax key) => key.DotKeys is { ChildrenCount: > 0 };

    /// <summary>The whole key with its parts joined by dots, as a reader would write it.</summary>
    public static string FullName(KeySyntax key)
    {
        var parts = new List<string> { PartName(key.Key) };
        if (key.DotKeys is { } dots)
        {
            foreach (var item in dots)
            {
                parts.Add(PartName(item.Key));
            }
        }

        return string.Join('.', parts);
    }
}
