using System.Collections.Immutable;
using Tomlyn.Syntax;

namespace TermLocus.Core.Plants;

/// <summary>Reads the <c>[[operating_points]]</c> records, each checked against the parameters.</summary>
internal static class OperatingPointsReader
{
    private static readonly string[] RecordKeys = ["name", "saved", "by", "values", "verdict", "note"];

    /// <summary>The records in file order.</summary>
    public static ImmutableArray<OperatingPoint> Read(PlantSyntaxContext context, IReadOnlyList<TableSyntaxBase> records, ImmutableArray<Parameter> parameters)
    {
        var builder = ImmutableArray.CreateBuilder<OperatingPoint>(records.Count);
        foreach (var record in records)
        {
            builder.Add(ReadOne(context, record, parameters));
        }

        return builder.MoveToImmutable();
    }

    private static OperatingPoint ReadOne(PlantSyntaxContext context, TableSyntaxBase record, ImmutableArray<Parameter> parameters)
    {
        var items = KeyedItems.Collect(context, record.Items ?? [], "[[operating_points]]", RecordKeys);
        string Text(string key) => items.Find(key) is { } item ? TomlValues.Text(context, item, key) : string.Empty;
        var valuesItem = items.Find("values") ?? throw context.Fail(record, "[[operating_points]] record needs 'values', e.g. values = { K = 1.5 }");
        DateTimeOffset? saved = items.Find("saved") is { } s ? TomlValues.Instant(context, s, "saved") : null;
        return new OperatingPoint(Text("name"), saved, Text("by"), ReadValues(context, valuesItem, parameters), Text("verdict"), Text("note"));
    }

    private static ImmutableDictionary<string, double> ReadValues(PlantSyntaxContext context, KeyValueSyntax valuesItem, ImmutableArray<Parameter> parameters)
    {
        if (valuesItem.Value is not InlineTableSyntax table)
        {
            throw TomlValues.WrongType(context, valuesItem.Value!, "values", "an inline table like { K = 1.5 }");
        }

        var names = parameters.Select(p => p.Name).ToHashSet(StringComparer.Ordinal);
        var builder = ImmutableDictionary.CreateBuilder<string, double>(StringComparer.Ordinal);
        foreach (var (name, item) in KeyedItems.Collect(context, table, "'values'", null).Ordered)
        {
            if (!names.Contains(name))
            {
                throw context.Fail(item.Key!, $"operating point value '{PlantTextSafety.Visible(name)}' names no parameter{KeySuggestion.Hint(name, names)}");
            }

            builder.Add(name, TomlValues.Number(context, item, name));
        }

        return builder.ToImmutable();
    }
}
