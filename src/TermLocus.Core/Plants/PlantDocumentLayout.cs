using Tomlyn.Syntax;

namespace TermLocus.Core.Plants;

/// <summary>
/// The top level of a plant file sorted out: the top-level keys and the known tables, with duplicate,
/// misspelt and wrongly bracketed tables rejected at their header.
/// </summary>
internal sealed class PlantDocumentLayout
{
    private static readonly string[] TopKeys = ["title", "note"];
    private static readonly string[] SingleTables = ["parameters", "loop", "specs"];
    private const string RecordTable = "operating_points";

    private readonly Dictionary<string, TableSyntaxBase> tables = new(StringComparer.Ordinal);

    private PlantDocumentLayout(KeyedItems topLevel) => TopLevel = topLevel;

    /// <summary>The keys before the first table (title, note).</summary>
    public KeyedItems TopLevel { get; }

    /// <summary>The <c>[[operating_points]]</c> records in file order.</summary>
    public List<TableSyntaxBase> OperatingPoints { get; } = [];

    /// <summary>The single table called <paramref name="name"/>, or null.</summary>
    public TableSyntaxBase? Table(string name) => tables.GetValueOrDefault(name);

    /// <summary>Sorts out <paramref name="document"/>'s top level.</summary>
    public static PlantDocumentLayout Collect(PlantSyntaxContext context, DocumentSyntax document)
    {
        foreach (var item in document.KeyValues)
        {
            var name = TomlKeys.FullName(item.Key!);
            if (SingleTables.Contains(name) || name == RecordTable)
            {
                var brackets = name == RecordTable ? $"[[{name}]]" : $"[{name}]";
                throw context.Fail(item.Key!, $"'{name}' must be a table: write {brackets} on its own line");
            }
        }

        var layout = new PlantDocumentLayout(KeyedItems.Collect(context, document.KeyValues, "the top level", TopKeys));
        foreach (var table in document.Tables)
        {
            layout.Add(context, table);
        }

        return layout;
    }

    private void Add(PlantSyntaxContext context, TableSyntaxBase table)
    {
        var name = TomlKeys.FullName(table.Name!);
        var isArray = table is TableArraySyntax;
        if (name == RecordTable)
        {
            OperatingPoints.Add(isArray ? table : throw context.Fail(table, "write [[operating_points]] with double brackets: each operating point is one record"));
            return;
        }

        if (!SingleTables.Contains(name))
        {
            throw context.Fail(table, UnknownTableMessage(name, isArray));
        }

        if (isArray)
        {
            throw context.Fail(table, $"write [{name}] with single brackets");
        }

        if (tables.TryGetValue(name, out var first))
        {
            throw context.Fail(table, $"duplicate table [{name}] (first opened at {context.Where(first)})");
        }

        tables.Add(name, table);
    }

    private static string UnknownTableMessage(string name, bool isArray)
    {
        var visible = isArray ? $"[{PlantTextSafety.Visible(name)}]" : PlantTextSafety.Visible(name);
        if (name.StartsWith("parameters.", StringComparison.Ordinal))
        {
            var parameter = PlantTextSafety.Visible(name["parameters.".Length..]);
            return $"unknown table [{visible}]; write {parameter} = {{ value = ... }} under [parameters]";
        }

        var closest = NameSuggestion.Closest(name, SingleTables.Append(RecordTable));
        var hint = closest is null ? string.Empty : closest == RecordTable ? $" (did you mean [[{closest}]]?)" : $" (did you mean [{closest}]?)";
        return $"unknown table [{visible}]{hint}";
    }
}
