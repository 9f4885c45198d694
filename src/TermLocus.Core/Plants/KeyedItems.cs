using Tomlyn.Syntax;

namespace TermLocus.Core.Plants;

/// <summary>
/// The key/value pairs of one table or inline table, by name, in file order: duplicate keys, dotted keys and
/// (when the allowed names are known) unknown keys are rejected at the offending key.
/// </summary>
internal sealed class KeyedItems
{
    private readonly Dictionary<string, KeyValueSyntax> byName = new(StringComparer.Ordinal);
    private readonly List<(string Name, KeyValueSyntax Item)> ordered = [];

    private KeyedItems()
    {
    }

    /// <summary>The pairs in file order.</summary>
    public IReadOnlyList<(string Name, KeyValueSyntax Item)> Ordered => ordered;

    /// <summary>
    /// Collects <paramref name="items"/>. <paramref name="where"/> names the table in messages (e.g. "[loop]");
    /// <paramref name="allowed"/> lists the accepted keys, or is null when any name is accepted.
    /// </summary>
    public static KeyedItems Collect(PlantSyntaxContext context, IEnumerable<KeyValueSyntax> items, string where, IReadOnlyCollection<string>? allowed)
    {
        var result = new KeyedItems();
        foreach (var item in items)
        {
            var key = item.Key!;
            var name = TomlKeys.PartName(key.Key);
            if (TomlKeys.IsDotted(key))
            {
                throw context.Fail(key, $"dotted key '{PlantTextSafety.Visible(TomlKeys.FullName(key))}' is not used in {where}; write each setting as its own key");
            }

            if (allowed is not null && !allowed.Contains(name))
            {
                throw context.Fail(key, $"unknown key '{PlantTextSafety.Visible(name)}' in {where}{KeySuggestion.Hint(name, allowed)}");
            }

            if (result.byName.TryGetValue(name, out var first))
            {
                throw context.Fail(key, $"duplicate key '{PlantTextSafety.Visible(name)}' in {where} (first set at {context.Where(first.Key!)})");
            }

            result.byName.Add(name, item);
            result.ordered.Add((name, item));
        }

        return result;
    }

    /// <summary>Collects the pairs of an inline table.</summary>
    public static KeyedItems Collect(PlantSyntaxContext context, InlineTableSyntax table, string where, IReadOnlyCollection<string>? allowed) =>
        Collect(context, table.Items?.Select(i => i.KeyValue!).Where(kv => kv is not null) ?? [], where, allowed);

    /// <summary>The pair called <paramref name="name"/>, or null.</summary>
    public KeyValueSyntax? Find(string name) => byName.GetValueOrDefault(name);
}
