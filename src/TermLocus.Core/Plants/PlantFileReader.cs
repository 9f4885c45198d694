using System.Collections.Immutable;
using System.Security.Cryptography;
using Tomlyn.Parsing;
using Tomlyn.Syntax;

namespace TermLocus.Core.Plants;

/// <summary>
/// Loads plant files (TOML 1.0, see the plant-file design) into validated <see cref="Plant"/> records. Every problem
/// is a <see cref="PlantFileException"/> whose <see cref="PlantFileError"/> prints as one line,
/// <c>FILE:LINE:COL: error: MESSAGE</c>, pointing at the offending key or value; no other exception escapes for bad
/// input. Expressions are kept as text (with each character's file position) and are parsed by the loop model.
/// Uses Tomlyn's syntax tree only (no reflection), so it is NativeAOT-safe.
/// </summary>
public static class PlantFileReader
{
    /// <summary>The largest plant file accepted, in bytes (1 MiB).</summary>
    public const int MaxFileBytes = PlantFileBytes.MaxBytes;

    /// <summary>Reads and validates the plant file at <paramref name="path"/>.</summary>
    /// <exception cref="PlantFileException">The file cannot be read or is not a valid plant file.</exception>
    public static Plant Read(string path) => ReadDocument(path).Plant;

    /// <summary>Like <see cref="Read"/>, but returns false with the located error instead of throwing.</summary>
    public static bool TryRead(string path, out Plant? plant, out PlantFileError? error)
    {
        try
        {
            plant = Read(path);
            error = null;
            return true;
        }
        catch (PlantFileException e)
        {
            plant = null;
            error = e.Error;
            return false;
        }
    }

    /// <summary>Reads the plant file at <paramref name="path"/> keeping its bytes, hash and text style for saving.</summary>
    /// <exception cref="PlantFileException">The file cannot be read (missing, unreadable, over <see cref="MaxFileBytes"/>,
    /// not UTF-8) or is not a valid plant file.</exception>
    public static PlantDocument ReadDocument(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        return ParseDocument(PlantFileBytes.ReadBounded(path), path);
    }

    /// <summary>Validates <paramref name="bytes"/> as the content of a plant file named <paramref name="path"/>.</summary>
    /// <exception cref="PlantFileException">Over <see cref="MaxFileBytes"/>, not UTF-8, or not a valid plant file.</exception>
    public static PlantDocument ParseDocument(ReadOnlySpan<byte> bytes, string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (bytes.Length > MaxFileBytes)
        {
            throw new PlantFileException(new PlantFileError(path, new SourcePosition(1, 1), $"the file is too large ({bytes.Length} bytes; a plant file may have at most {MaxFileBytes} bytes)"));
        }

        var (text, hasBom) = PlantFileBytes.Decode(bytes, path);
        var plant = Parse(text, path);
        return new PlantDocument(path, [.. bytes], [.. SHA256.HashData(bytes)], hasBom, PlantDocument.DetectNewLine(text), text, plant);
    }

    /// <summary>
    /// Validates <paramref name="text"/> as a plant file; <paramref name="path"/> names it in errors and in
    /// <see cref="Plant.Path"/>. A leading BOM character is ignored.
    /// </summary>
    /// <exception cref="PlantFileException">The text is not a valid plant file.</exception>
    public static Plant Parse(string text, string path)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(path);
        text = text.StartsWith('\uFEFF') ? text[1..] : text;
        var context = new PlantSyntaxContext(path, text);
        if (text.Length > MaxFileBytes)
        {
            throw context.Fail(new SourcePosition(1, 1), $"the text is too large ({text.Length} characters; a plant file may have at most {MaxFileBytes} bytes)");
        }

        var nul = text.IndexOf('\0', StringComparison.Ordinal);
        if (nul >= 0)
        {
            throw context.Fail(context.Map.PositionAt(nul), "NUL character (U+0000) in the file");
        }

        var replacement = text.IndexOf('\uFFFD', StringComparison.Ordinal);
        if (replacement >= 0)
        {
            // Tomlyn takes U+FFFD for a decoding failure and reports a misleading surrogate error.
            throw context.Fail(context.Map.PositionAt(replacement), "the replacement character U+FFFD cannot be read; inside a string write it as \\uFFFD");
        }

        // Tomlyn's validation pass is not run: the walk checks every rule it would (duplicate keys and tables, a
        // table given twice under two spellings) with better messages, and it would double the parse time.
        return Build(context, ParseSyntax(context));
    }

    private static Plant Build(PlantSyntaxContext context, DocumentSyntax document)
    {
        var layout = PlantDocumentLayout.Collect(context, document);
        var title = layout.TopLevel.Find("title") is { } t ? TomlValues.Text(context, t, "title") : Path.GetFileNameWithoutExtension(context.Path);
        var note = layout.TopLevel.Find("note") is { } n ? TomlValues.Text(context, n, "note") : string.Empty;
        var parameters = ParameterTableReader.Read(context, layout.Table("parameters"));
        var loopTable = layout.Table("loop")
            ?? throw context.Fail(new SourcePosition(1, 1), "missing table [loop] (with 'plant' or 'characteristic', and 'sweep')");
        var loop = LoopTableReader.Read(context, loopTable, parameters);
        var specs = SpecsTableReader.Read(context, layout.Table("specs"));
        var points = OperatingPointsReader.Read(context, layout.OperatingPoints, parameters);
        return new Plant(context.Path, title, note, parameters, loop, specs, points);
    }

    private static DocumentSyntax ParseSyntax(PlantSyntaxContext context)
    {
        DocumentSyntax document;
        try
        {
            document = SyntaxParser.Parse(context.Text, context.Path, validate: false);
        }
        catch (Exception e) when (e is not PlantFileException and not OutOfMemoryException)
        {
            // The parser's depth guard speaks of its own options and has no position; say it in the file's terms.
            if (e.Message.Contains("maximum depth", StringComparison.OrdinalIgnoreCase))
            {
                throw context.Fail(context.Map.PositionAt(PlantNesting.FirstTooDeep(context.Text, PlantNesting.MaxDepth)),
                    $"arrays and inline tables nested too deeply (more than {PlantNesting.MaxDepth} levels)");
            }

            throw context.Fail(new SourcePosition(1, 1), "the TOML parser failed: " + PlantTextSafety.Visible(e.Message, 200));
        }

        // Tomlyn lists parser errors before lexer errors; the earliest one in the file is the one to fix first.
        DiagnosticMessage? first = null;
        foreach (var diagnostic in document.Diagnostics)
        {
            if (diagnostic.Kind == DiagnosticMessageKind.Error && (first is null || diagnostic.Span.Start.Offset < first.Span.Start.Offset))
            {
                first = diagnostic;
            }
        }

        if (first is not null)
        {
            throw context.Fail(context.Map.PositionAt(first.Span.Start.Offset), SyntaxMessage(first.Message));
        }

        return document;
    }

    private static string SyntaxMessage(string message)
    {
        var visible = PlantTextSafety.Visible(message.Trim().TrimEnd('.'), 200);
        return visible.Length == 0 ? "invalid TOML" : "invalid TOML: " + char.ToLowerInvariant(visible[0]) + visible[1..];
    }
}
