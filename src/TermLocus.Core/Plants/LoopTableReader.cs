using System.Collections.Immutable;
using Tomlyn.Syntax;

namespace TermLocus.Core.Plants;

/// <summary>Reads <c>[loop]</c>: how the loop is built, which parameter is swept and which is varied.</summary>
internal static class LoopTableReader
{
    private static readonly string[] LoopKeys =
        ["plant", "controller", "sensor", "feedback", "characteristic", "sweep", "vary", "delay", "sample_time"];

    /// <summary>The loop definition, checked against <paramref name="parameters"/>.</summary>
    public static LoopDefinition Read(PlantSyntaxContext context, TableSyntaxBase table, ImmutableArray<Parameter> parameters)
    {
        var items = KeyedItems.Collect(context, table.Items ?? [], "[loop]", LoopKeys);
        var (plant, controller, sensor, characteristic) = ReadExpressions(context, table, items);
        var feedback = ReadFeedback(context, items.Find("feedback"));
        var sweepItem = items.Find("sweep") ?? throw context.Fail(table, "[loop] needs 'sweep', the parameter the locus is traced over");
        var sweep = TomlValues.Text(context, sweepItem, "sweep");
        _ = FindNamed(context, sweepItem, sweep, parameters, "sweep");
        var vary = ReadVary(context, items.Find("vary"), sweep, parameters);
        var delay = items.Find("delay") is { } d ? Limited(context, d, "delay", x => x >= 0, "0 or more seconds") : (double?)null;
        var sample = items.Find("sample_time") is { } t ? Limited(context, t, "sample_time", x => x > 0, "more than 0 seconds") : (double?)null;
        return new LoopDefinition(plant, controller, sensor, feedback, characteristic, sweep, vary, delay, sample);
    }

    /// <summary>A number that must satisfy <paramref name="valid"/>, else an error saying it must be <paramref name="expected"/>.</summary>
    public static double Limited(PlantSyntaxContext context, KeyValueSyntax item, string key, Func<double, bool> valid, string expected)
    {
        var value = TomlValues.Number(context, item, key);
        return valid(value) ? value : throw context.Fail(item.Value!, $"'{key}' must be {expected}, not {PlantSyntaxContext.Show(value)}");
    }

    private static (ExpressionText? Plant, ExpressionText? Controller, ExpressionText? Sensor, ExpressionText? Characteristic) ReadExpressions(
        PlantSyntaxContext context, TableSyntaxBase table, KeyedItems items)
    {
        ExpressionText? Read(string key) => items.Find(key) is { } item ? TomlValues.Expression(context, item, key) : null;
        var characteristicItem = items.Find("characteristic");
        if (characteristicItem is not null)
        {
            foreach (var key in (string[])["plant", "controller", "sensor"])
            {
                if (items.Find(key) is { } clash)
                {
                    var later = clash.Span.Start.Offset > characteristicItem.Span.Start.Offset ? clash : characteristicItem;
                    throw context.Fail(later.Key!, $"[loop] has both '{key}' and 'characteristic'; give the loop's parts or its characteristic polynomial, not both");
                }
            }

            return (null, null, null, Read("characteristic"));
        }

        if (items.Find("plant") is null)
        {
            throw context.Fail(table, "[loop] needs 'plant' (with optional 'controller' and 'sensor') or 'characteristic'");
        }

        return (Read("plant"), Read("controller"), Read("sensor"), null);
    }

    private static FeedbackSign ReadFeedback(PlantSyntaxContext context, KeyValueSyntax? item)
    {
        if (item is null)
        {
            return FeedbackSign.Negative;
        }

        return TomlValues.Text(context, item, "feedback") switch
        {
            "negative" => FeedbackSign.Negative,
            "positive" => FeedbackSign.Positive,
            var other => throw context.Fail(item.Value!, $"'feedback' must be \"negative\" or \"positive\", not \"{PlantTextSafety.Visible(other)}\""),
        };
    }

    private static string? ReadVary(PlantSyntaxContext context, KeyValueSyntax? item, string sweep, ImmutableArray<Parameter> parameters)
    {
        if (item is null)
        {
            return null;
        }

        var vary = TomlValues.Text(context, item, "vary");
        var varied = FindNamed(context, item, vary, parameters, "vary");
        if (varied.Band is null)
        {
            throw context.Fail(item.Value!, $"'vary' names '{vary}', which has no band or tolerance_pct");
        }

        return vary != sweep ? vary : throw context.Fail(item.Value!, $"'vary' names the swept parameter '{vary}'; vary another parameter");
    }

    private static Parameter FindNamed(PlantSyntaxContext context, KeyValueSyntax item, string name, ImmutableArray<Parameter> parameters, string key)
    {
        foreach (var parameter in parameters)
        {
            if (parameter.Name == name)
            {
                return parameter;
            }
        }

        var hint = KeySuggestion.Hint(name, parameters.Select(p => p.Name));
        throw context.Fail(item.Value!, $"'{key}' names '{PlantTextSafety.Visible(name)}', which is not in [parameters]{hint}");
    }
}
