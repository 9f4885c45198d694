using System.Collections.Immutable;
using System.Text;
using Tomlyn.Parsing;
using Tomlyn.Syntax;

namespace TermLocus.Core.Plants;

/// <summary>
/// Saves an operating point into a plant file's text with the smallest possible change: the swept parameter's
/// <c>value</c> is replaced in place (its line's comment, spacing and everything else untouched) and one
/// <c>[[operating_points]]</c> record is appended at the end, in the file's newline style. Every other byte stays as
/// it was (BOM, CRLF, tabs, comments, number spellings, key order, a missing final newline). Writes TOML 1.0 only.
/// </summary>
public static class OperatingPointWriter
{
    /// <summary>
    /// The text of <paramref name="originalText"/> with <paramref name="sweptName"/>'s value set to
    /// <paramref name="newValue"/> and <paramref name="record"/> appended. <paramref name="path"/> names the file in errors.
    /// </summary>
    /// <exception cref="PlantFileException">The original is not a valid plant file, or the result would not be one
    /// (for example the new value lies outside the parameter's band).</exception>
    /// <exception cref="ArgumentException"><paramref name="sweptName"/> is not a parameter of the file, a value is not
    /// finite, or the record gives the swept parameter a different value.</exception>
    public static string Apply(string originalText, string sweptName, double newValue, OperatingPointRecord record, string path = "plant file")
    {
        ArgumentNullException.ThrowIfNull(originalText);
        ArgumentNullException.ThrowIfNull(sweptName);
        ArgumentNullException.ThrowIfNull(record);
        var bom = originalText.StartsWith('\uFEFF') ? "\uFEFF" : string.Empty;
        var body = originalText[bom.Length..];
        var original = PlantFileReader.Parse(body, path);
        var values = ValuesWithSwept(record.Values, sweptName, newValue);
        var (start, length) = ValueSpan(body, path, sweptName);
        var result = new StringBuilder(originalText.Length + 256)
            .Append(bom)
            .Append(body, 0, start)
            .Append(TomlWriting.Float(newValue))
            .Append(body, start + length, body.Length - start - length)
            .Append(RecordText(body, record, values))
            .ToString();
        try
        {
            Confirm(result, path, sweptName, newValue);
        }
        catch (PlantFileException e)
        {
            // Report at the parameter in the file as it is on disk, not at a place in text never written.
            var at = original.FindParameter(sweptName)!.Location;
            throw new PlantFileException(new PlantFileError(path, at, $"cannot save {PlantSyntaxContext.Show(newValue)} as '{sweptName}': {e.Error.Message}"));
        }

        return result;
    }

    /// <summary>Like <see cref="Apply(string, string, double, OperatingPointRecord, string)"/>, but returns false with
    /// the located error when the original or the result is not a valid plant file.</summary>
    public static bool TryApply(string originalText, string sweptName, double newValue, OperatingPointRecord record, string path, out string? newText, out PlantFileError? error)
    {
        try
        {
            newText = Apply(originalText, sweptName, newValue, record, path);
            error = null;
            return true;
        }
        catch (PlantFileException e)
        {
            newText = null;
            error = e.Error;
            return false;
        }
    }

    /// <summary>The new bytes of <paramref name="document"/> (UTF-8, its BOM kept) with its swept parameter set to
    /// <paramref name="newValue"/> and <paramref name="record"/> appended; ready for <see cref="AtomicFileSaver"/>.</summary>
    /// <exception cref="PlantFileException">The result would not be a valid plant file.</exception>
    public static byte[] Apply(PlantDocument document, double newValue, OperatingPointRecord record)
    {
        ArgumentNullException.ThrowIfNull(document);
        var text = Apply(document.Text, document.Plant.Loop.Sweep, newValue, record, document.Path);
        var preamble = document.HasBom ? Encoding.UTF8.Preamble.ToArray() : [];
        return [.. preamble, .. Encoding.UTF8.GetBytes(text)];
    }

    private static ImmutableArray<KeyValuePair<string, double>> ValuesWithSwept(ImmutableArray<KeyValuePair<string, double>> values, string sweptName, double newValue)
    {
        values = values.IsDefault ? [] : values;
        foreach (var (name, value) in values)
        {
            if (!double.IsFinite(value))
            {
                throw new ArgumentException($"The value of '{name}' is not finite.", nameof(values));
            }

            if (name == sweptName && value != newValue)
            {
                throw new ArgumentException($"The record gives '{name}' the value {value}, not the saved {newValue}.", nameof(values));
            }
        }

        return values.Any(v => v.Key == sweptName) ? values : values.Insert(0, new(sweptName, newValue));
    }

    // Offset and length of the swept parameter's number token: `K = 1.5` or the `value` of `K = { value = 1.5 }`.
    private static (int Start, int Length) ValueSpan(string body, string path, string sweptName)
    {
        var document = SyntaxParser.Parse(body, path, validate: false);
        foreach (var table in document.Tables)
        {
            if (table is not TableSyntax || TomlKeys.FullName(table.Name!) != "parameters")
            {
                continue;
            }

            foreach (var item in table.Items!)
            {
                if (!TomlKeys.IsDotted(item.Key!) && TomlKeys.PartName(item.Key!.Key) == sweptName)
                {
                    var value = item.Value is InlineTableSyntax inline ? InlineValue(inline) : item.Value!;
                    return (value.Span.Start.Offset, value.Span.End.Offset - value.Span.Start.Offset + 1);
                }
            }
        }

        throw new ArgumentException($"'{sweptName}' is not a parameter of this plant file.", nameof(sweptName));
    }

    private static ValueSyntax InlineValue(InlineTableSyntax inline)
    {
        foreach (var entry in inline.Items!)
        {
            if (entry.KeyValue is { } pair && TomlKeys.PartName(pair.Key!.Key) == "value")
            {
                return pair.Value!;
            }
        }

        throw new InvalidOperationException("A validated parameter table has no 'value'.");
    }

    private static string RecordText(string body, OperatingPointRecord record, ImmutableArray<KeyValuePair<string, double>> values)
    {
        var nl = PlantDocument.DetectNewLine(body);
        var separator = body.Length == 0 || body.EndsWith("\n\n", StringComparison.Ordinal) || body.EndsWith("\n\r\n", StringComparison.Ordinal)
            ? string.Empty
            : body.EndsWith('\n') ? nl : nl + nl;
        var pairs = string.Join(", ", values.Select(v => $"{TomlWriting.Key(v.Key)} = {TomlWriting.Float(v.Value)}"));
        return new StringBuilder(separator)
            .Append("[[operating_points]]").Append(nl)
            .Append("name = ").Append(TomlWriting.BasicString(record.Name)).Append(nl)
            .Append("saved = ").Append(TomlWriting.UtcDateTime(record.SavedUtc)).Append(nl)
            .Append("by = ").Append(TomlWriting.BasicString(record.By)).Append(nl)
            .Append("values = { ").Append(pairs).Append(" }").Append(nl)
            .Append("verdict = ").Append(TomlWriting.BasicString(record.Verdict)).Append(nl)
            .Append("note = ").Append(TomlWriting.BasicString(record.Note)).Append(nl)
            .ToString();
    }

    // Reading the result back is the final word: it must be a valid plant file with the new value in place.
    private static void Confirm(string result, string path, string sweptName, double newValue)
    {
        var plant = PlantFileReader.Parse(result, path);
        if (plant.FindParameter(sweptName)?.Value != newValue)
        {
            throw new InvalidOperationException($"Saving '{sweptName}' did not leave the new value in place.");
        }
    }
}
