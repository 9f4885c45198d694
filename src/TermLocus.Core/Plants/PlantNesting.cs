namespace TermLocus.Core.Plants;

/// <summary>
/// Finds where a TOML text nests arrays and inline tables deeper than the parser allows, so that its depth error
/// can be located. A light scan: brackets and braces are counted outside strings and comments.
/// </summary>
internal static class PlantNesting
{
    /// <summary>The deepest nesting the TOML parser accepts (Tomlyn's default maximum depth).</summary>
    public const int MaxDepth = 64;

    /// <summary>The offset of the first bracket or brace that opens level <paramref name="limit"/> + 1, or 0.</summary>
    public static int FirstTooDeep(string text, int limit)
    {
        int depth = 0;
        char quote = '\0';
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            if (quote != '\0')
            {
                if (c == '\\' && quote == '"')
                {
                    i++;
                }
                else if (c == quote || c == '\n')
                {
                    quote = '\0';
                }
            }
            else if (c is '"' or '\'')
            {
                quote = c;
            }
            else if (c == '#')
            {
                int end = text.IndexOf('\n', i);
                i = end < 0 ? text.Length : end;
            }
            else if (c is '[' or '{' && ++depth > limit)
            {
                return i;
            }
            else if (c is ']' or '}')
            {
                depth = Math.Max(0, depth - 1);
            }
        }

        return 0;
    }
}
