using System.Collections.Immutable;
using Tomlyn;
using Tomlyn.Syntax;

namespace TermLocus.Core.Plants;

/// <summary>Typed reads of TOML values with located errors that name the key and what was expected.</summary>
internal static class TomlValues
{
    /// <summary>A finite number (TOML integer or float) from <paramref name="item"/>'s value.</summary>
    public static double Number(PlantSyntaxContext context, KeyValueSyntax item, string key) => Number(context, item.Value!, key);

    /// <summary>A finite number from a value node.</summary>
    public static double Number(PlantSyntaxContext context, ValueSyntax value, string key)
    {
        switch (value)
        {
            case IntegerValueSyntax integer:
                return integer.Value;
            case FloatValueSyntax real when double.IsFinite(real.Value):
                return real.Value;
            case FloatValueSyntax real:
                throw context.Fail(value, $"'{key}' must be a finite number, not {TokenText(real.Token)}");
            default:
                throw WrongType(context, value, key, "a number");
        }
    }

    /// <summary>A string from <paramref name="item"/>'s value.</summary>
    public static string Text(PlantSyntaxContext context, KeyValueSyntax item, string key) =>
        item.Value is StringValueSyntax text ? text.Value ?? string.Empty : throw WrongType(context, item.Value!, key, "a string");

    /// <summary>
    /// A [low, high] pair of finite numbers with low &lt; high. <paramref name="key"/> names it in messages.
    /// </summary>
    public static Interval Pair(PlantSyntaxContext context, KeyValueSyntax item, string key)
    {
        if (item.Value is not ArraySyntax array)
        {
            throw WrongType(context, item.Value!, key, "[low, high]");
        }

        var values = array.Items?.Select(i => i.Value!).ToList() ?? [];
        if (values.Count != 2)
        {
            throw context.Fail(array, $"'{key}' must be [low, high] (2 numbers), not {values.Count} item{(values.Count == 1 ? string.Empty : "s")}");
        }

        var low = Number(context, values[0], key);
        var high = Number(context, values[1], key);
        if (low >= high)
        {
            var problem = low == high ? "is empty" : "is reversed";
            throw context.Fail(array, $"'{key}' [{PlantSyntaxContext.Show(low)}, {PlantSyntaxContext.Show(high)}] {problem}: low must be less than high");
        }

        return new Interval(low, high);
    }

    /// <summary>A non-empty expression string with the file position of each of its characters.</summary>
    public static ExpressionText Expression(PlantSyntaxContext context, KeyValueSyntax item, string key)
    {
        if (item.Value is not StringValueSyntax text)
        {
            throw WrongType(context, item.Value!, key, "a string holding an expression");
        }

        var value = text.Value ?? string.Empty;
        if (string.IsNullOrWhiteSpace(value))
        {
            throw context.Fail(text, $"'{key}' is empty; it needs an expression");
        }

        return new ExpressionText(key, value, Positions(context, text, value));
    }

    /// <summary>A date-time with a zone (<c>2026-11-30T14:05:00Z</c>), as UTC.</summary>
    public static DateTimeOffset Instant(PlantSyntaxContext context, KeyValueSyntax item, string key)
    {
        if (item.Value is DateTimeValueSyntax date && date.Value.Kind is TomlDateTimeKind.OffsetDateTimeByZ or TomlDateTimeKind.OffsetDateTimeByNumber)
        {
            return date.Value.DateTime.ToUniversalTime();
        }

        throw WrongType(context, item.Value!, key, "a date-time with a zone, like 2026-11-30T14:05:00Z");
    }

    /// <summary>The error for a value of the wrong kind.</summary>
    public static PlantFileException WrongType(PlantSyntaxContext context, ValueSyntax value, string key, string expected) =>
        context.Fail(value, $"'{key}' must be {expected}, not {Describe(value)}");

    /// <summary>What kind of TOML value a node is, for messages.</summary>
    public static string Describe(ValueSyntax value) => value switch
    {
        StringValueSyntax => "a string",
        IntegerValueSyntax or FloatValueSyntax => "a number",
        BooleanValueSyntax => "true/false",
        DateTimeValueSyntax date when date.Value.Kind is TomlDateTimeKind.LocalDate => "a date",
        DateTimeValueSyntax date when date.Value.Kind is TomlDateTimeKind.LocalTime => "a time of day",
        DateTimeValueSyntax date when date.Value.Kind is TomlDateTimeKind.LocalDateTime => "a date-time without a zone",
        DateTimeValueSyntax => "a date-time",
        ArraySyntax => "an array",
        InlineTableSyntax => "an inline table",
        _ => "this value",
    };

    private static string TokenText(SyntaxToken? token) => PlantTextSafety.Visible(token?.Text ?? "?");

    // Maps each decoded character to its file position; if our decoding ever disagreed with the parser's value,
    // fall back to the string's start rather than report a wrong place.
    private static ImmutableArray<SourcePosition> Positions(PlantSyntaxContext context, StringValueSyntax text, string value)
    {
        var start = text.Span.Start.Offset;
        var decoded = TomlStringDecoder.Decode(text.Token?.Text ?? string.Empty);

        // Compared once, not per character: per character it made a long expression quadratic (seconds for 100 kB).
        var offsets = decoded is { } d && string.Equals(d.Value, value, StringComparison.Ordinal) ? d.Offsets : null;
        var builder = ImmutableArray.CreateBuilder<SourcePosition>(value.Length + 1);
        for (var i = 0; i <= value.Length; i++)
        {
            builder.Add(context.Map.PositionAt(offsets is null ? start : start + offsets[i]));
        }

        return builder.MoveToImmutable();
    }
}
