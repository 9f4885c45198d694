using System.Collections.Immutable;
using Tomlyn.Syntax;

namespace TermLocus.Core.Plants;

/// <summary>Reads <c>[parameters]</c>: <c>name = number</c> or <c>name = { value = ..., ... }</c>.</summary>
internal static class ParameterTableReader
{
    /// <summary>Largest accepted tolerance_pct (exclusive), percent: a band reaching zero or past it is not a tolerance.</summary>
    public const double MaxTolerancePct = 100;

    private static readonly string[] DetailKeys = ["value", "range", "band", "tolerance_pct", "unit", "note"];

    /// <summary>The parameters in file order; empty when the table is absent.</summary>
    public static ImmutableArray<Parameter> Read(PlantSyntaxContext context, TableSyntaxBase? table)
    {
        if (table?.Items is null)
        {
            return [];
        }

        var builder = ImmutableArray.CreateBuilder<Parameter>();
        foreach (var (name, item) in KeyedItems.Collect(context, table.Items, "[parameters]", null).Ordered)
        {
            if (PlantNames.Problem(name) is { } problem)
            {
                throw context.Fail(item.Key!, problem);
            }

            var location = context.PositionOf(item.Key!);
            builder.Add(item.Value switch
            {
                IntegerValueSyntax or FloatValueSyntax => new Parameter(name, TomlValues.Number(context, item, name), null, null, string.Empty, string.Empty, location),
                InlineTableSyntax details => ReadDetails(context, name, details, location),
                _ => throw TomlValues.WrongType(context, item.Value!, name, "a number or { value = ... }"),
            });
        }

        return builder.ToImmutable();
    }

    private static Parameter ReadDetails(PlantSyntaxContext context, string name, InlineTableSyntax details, SourcePosition location)
    {
        var items = KeyedItems.Collect(context, details, $"parameter '{name}'", DetailKeys);
        var valueItem = items.Find("value") ?? throw context.Fail(details, $"parameter '{name}' needs 'value'");
        var value = TomlValues.Number(context, valueItem, "value");
        Interval? range = items.Find("range") is { } r ? TomlValues.Pair(context, r, "range") : null;
        var band = ReadBand(context, name, value, items);
        var unit = items.Find("unit") is { } u ? TomlValues.Text(context, u, "unit") : string.Empty;
        var note = items.Find("note") is { } n ? TomlValues.Text(context, n, "note") : string.Empty;
        return new Parameter(name, value, range, band, unit, note, location);
    }

    private static Interval? ReadBand(PlantSyntaxContext context, string name, double value, KeyedItems items)
    {
        var bandItem = items.Find("band");
        var pctItem = items.Find("tolerance_pct");
        if (bandItem is not null && pctItem is not null)
        {
            var later = bandItem.Span.Start.Offset > pctItem.Span.Start.Offset ? bandItem : pctItem;
            throw context.Fail(later.Key!, $"parameter '{name}' has both 'band' and 'tolerance_pct'; give one of them");
        }

        if (bandItem is not null)
        {
            var band = TomlValues.Pair(context, bandItem, "band");
            return band.Contains(value)
                ? band
                : throw context.Fail(bandItem.Value!, $"band [{PlantSyntaxContext.Show(band.Low)}, {PlantSyntaxContext.Show(band.High)}] does not contain the value {PlantSyntaxContext.Show(value)} of '{name}'");
        }

        return pctItem is null ? null : BandFromPercent(context, name, value, pctItem);
    }

    private static Interval BandFromPercent(PlantSyntaxContext context, string name, double value, KeyValueSyntax pctItem)
    {
        var pct = TomlValues.Number(context, pctItem, "tolerance_pct");
        if (!(pct > 0 && pct < MaxTolerancePct))
        {
            throw context.Fail(pctItem.Value!, $"'tolerance_pct' must be more than 0 and less than 100, not {PlantSyntaxContext.Show(pct)}");
        }

        if (value == 0)
        {
            throw context.Fail(pctItem.Key!, $"'tolerance_pct' of the zero value of '{name}' gives an empty band; give band = [low, high] instead");
        }

        var spread = Math.Abs(value) * pct / 100;
        return new Interval(value - spread, value + spread);
    }
}
