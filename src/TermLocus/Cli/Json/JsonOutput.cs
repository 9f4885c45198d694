using System.Globalization;
using System.Numerics;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using TermLocus.App.Text;

namespace TermLocus.Cli.Json;

/// <summary>
/// Helpers for the versioned JSON contracts: numbers as JSON numbers, non-finite values as null,
/// complex values as {"re","im"}. Written with Utf8JsonWriter so nothing depends on reflection.
/// </summary>
internal static class JsonOutput
{
    private static readonly JsonWriterOptions Options = new()
    {
        Indented = true,
        // Text from plant files is escaped by the writer; keep non-ASCII letters readable.
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        // Only line feeds between tokens, so every other control character in the text lies inside a string.
        NewLine = "\n",
    };

    /// <summary>Runs <paramref name="write"/> against a fresh writer and returns the UTF-8 text with a final newline.</summary>
    public static string Write(Action<Utf8JsonWriter> write)
    {
        using var stream = new MemoryStream();
        using (var writer = new Utf8JsonWriter(stream, Options))
        {
            write(writer);
        }

        return EscapeControls(Encoding.UTF8.GetString(stream.ToArray())) + "\n";
    }

    // The relaxed encoder lets bidirectional overrides and line separators through raw, and a terminal showing the
    // JSON would act on them. Outside strings the writer emits only ASCII and line feeds, so any such character sits
    // inside a string, where \uXXXX means the same character: the document stays valid and carries the same text.
    private static string EscapeControls(string json)
    {
        if (!json.Any(c => c != '\n' && SafeText.IsControl(c)))
        {
            return json;
        }

        var sb = new StringBuilder(json.Length + 16);
        foreach (char c in json)
        {
            if (c != '\n' && SafeText.IsControl(c))
            {
                sb.Append(CultureInfo.InvariantCulture, $"\\u{(int)c:X4}");
            }
            else
            {
                sb.Append(c);
            }
        }

        return sb.ToString();
    }

    /// <summary>A number, or null when it is absent or not finite.</summary>
    public static void Number(Utf8JsonWriter w, string name, double? value)
    {
        if (value is { } v && double.IsFinite(v))
        {
            w.WriteNumber(name, v);
        }
        else
        {
            w.WriteNull(name);
        }
    }

    /// <summary>A number as an array element, or null when not finite.</summary>
    public static void NumberValue(Utf8JsonWriter w, double? value)
    {
        if (value is { } v && double.IsFinite(v))
        {
            w.WriteNumberValue(v);
        }
        else
        {
            w.WriteNullValue();
        }
    }

    /// <summary>{"re": .., "im": ..} as a property.</summary>
    public static void Complex(Utf8JsonWriter w, string name, Complex z)
    {
        w.WritePropertyName(name);
        ComplexValue(w, z);
    }

    /// <summary>{"re": .., "im": ..} as a value.</summary>
    public static void ComplexValue(Utf8JsonWriter w, Complex z)
    {
        w.WriteStartObject();
        Number(w, "re", z.Real);
        Number(w, "im", z.Imaginary);
        w.WriteEndObject();
    }

    /// <summary>An object of parameter values by name, in the given order.</summary>
    public static void Values(Utf8JsonWriter w, string name, IEnumerable<KeyValuePair<string, double>> values)
    {
        w.WritePropertyName(name);
        w.WriteStartObject();
        foreach (var (key, value) in values)
        {
            Number(w, key, value);
        }

        w.WriteEndObject();
    }
}
