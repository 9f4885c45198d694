using System.Collections.Immutable;
using System.Text;
using CsCheck;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Plants;

/// <summary>
/// Golden tests: each expected output is written out by hand, byte for byte. The only differences allowed are the
/// swept value's token and the appended record (plant-file.md, "Meaning"; TOML 1.0 specification for the syntax).
/// </summary>
public sealed class OperatingPointWriterTests
{
    private static readonly DateTimeOffset Noon = new(2026, 11, 30, 12, 0, 0, TimeSpan.Zero);

    private static OperatingPointRecord Record(string name = "bench tune", params (string Name, double Value)[] values) =>
        new(name, Noon, "ana@rig4", [.. values.Select(v => KeyValuePair.Create(v.Name, v.Value))], "meets all specs", "");

    private static string RecordText(string nl, string values) =>
        $"[[operating_points]]{nl}name = \"bench tune\"{nl}saved = 2026-11-30T12:00:00Z{nl}by = \"ana@rig4\"{nl}"
        + $"values = {{ {values} }}{nl}verdict = \"meets all specs\"{nl}note = \"\"{nl}";

    [Fact]
    public void A_bare_value_is_replaced_in_place_keeping_spacing_and_comments()
    {
        const string original = "# rig 4 tuning\ntitle = \"t\"   # trailing\n\n[parameters]\nK   =   1.50    # gain, tuned in spring\n"
            + "T = { value = 0.5, tolerance_pct = 10 }\n\n[loop]\nplant = \"1 / (s * (T*s + 1))\"\ncontroller = \"K\"\nsweep = \"K\"\n\n# final comment\n";
        var expected = original.Replace("K   =   1.50    #", "K   =   2.25    #", StringComparison.Ordinal) + "\n" + RecordText("\n", "K = 2.25");

        var result = OperatingPointWriter.Apply(original, "K", 2.25, Record());

        Assert.Equal(expected, result);
    }

    [Fact]
    public void Crlf_bom_tabs_and_a_missing_final_newline_are_kept()
    {
        const string original = "\uFEFFtitle = \"t\"\r\n[parameters]\r\nK\t= { range = [0, 10], value = 1e0 }\t# c\r\n[loop]\r\nplant = \"K/s\"\r\nsweep = \"K\"";
        var expected = original.Replace("value = 1e0 }", "value = 0.125 }", StringComparison.Ordinal) + "\r\n\r\n" + RecordText("\r\n", "K = 0.125");

        var result = OperatingPointWriter.Apply(original, "K", 0.125, Record());

        Assert.Equal(expected, result);
    }

    [Fact]
    public void A_record_follows_earlier_records_and_lists_the_values_given()
    {
        const string original = "[parameters]\nK = { value = 3, range = [0, 10] }\nJ = { value = 2, band = [1, 3] }\n[loop]\nplant = \"K/(J*s)\"\nsweep = \"K\"\n\n"
            + "[[operating_points]]\nname = \"old\"\nvalues = { K = 3 }\n\n";
        var expected = original.Replace("value = 3,", "value = 4.5,", StringComparison.Ordinal) + RecordText("\n", "J = 2.0, K = 4.5");

        var result = OperatingPointWriter.Apply(original, "K", 4.5, Record(values: [("J", 2.0), ("K", 4.5)]));

        Assert.Equal(expected, result);
        Assert.Equal(2, PlantFileReader.Parse(result, "x.toml").OperatingPoints.Length);
    }

    [Theory]
    [InlineData(3.0, "3.0")]
    [InlineData(-0.5, "-0.5")]
    [InlineData(1e-7, "1e-07")]
    [InlineData(123456789.125, "123456789.125")]
    [InlineData(0.1, "0.1")]
    public void New_values_are_spelled_as_toml_floats(double value, string spelling)
    {
        const string original = "[parameters]\nK = 1\n[loop]\nplant = \"K/s\"\nsweep = \"K\"\n";

        var result = OperatingPointWriter.Apply(original.Replace("K = 1", "K = { value = 1, range = [-1, 1] }", StringComparison.Ordinal), "K", value, Record());

        Assert.Contains($"K = {{ value = {spelling}, range", result, StringComparison.Ordinal);
    }

    [Fact]
    public void Text_fields_are_escaped_and_read_back_unchanged()
    {
        const string original = "[parameters]\nK = { value = 1, range = [0, 5] }\n[loop]\nplant = \"K/s\"\nsweep = \"K\"\n";
        const string nasty = "say \"hi\" \\ tab\t nl\n cr\r esc\u001B[31m del\u007F c1\u0085 rlo\u202E 😀 é";
        var record = new OperatingPointRecord(nasty, Noon, "u\"@h", [], nasty, "line1\nline2");

        var result = OperatingPointWriter.Apply(original, "K", 2, record);

        var point = PlantFileReader.Parse(result, "x.toml").OperatingPoints.Single();
        Assert.Equal(nasty, point.Name);
        Assert.Equal(nasty, point.Verdict);
        Assert.Equal("u\"@h", point.By);
        Assert.Equal("line1\nline2", point.Note);
        Assert.Equal(2.0, point.Values["K"], 0);
        var appended = result[original.Length..];
        Assert.DoesNotContain(appended, c => c is '\u001B' or '\u007F' or '\u0085' or '\u202E' or '\r');
        Assert.Contains("esc\\u001B[31m", appended, StringComparison.Ordinal);
    }

    [Fact]
    public void A_lone_surrogate_is_written_as_the_replacement_character()
    {
        const string original = "[parameters]\nK = { value = 1, range = [0, 5] }\n[loop]\nplant = \"K/s\"\nsweep = \"K\"\n";

        var result = OperatingPointWriter.Apply(original, "K", 2, Record(name: "a\uD800b"));

        Assert.Equal("a\uFFFDb", PlantFileReader.Parse(result, "x.toml").OperatingPoints.Single().Name);
        Assert.Contains("name = \"a\\uFFFDb\"", result, StringComparison.Ordinal);
    }

    [Fact]
    public void A_value_outside_the_parameters_band_is_refused_with_a_located_error()
    {
        const string original = "[parameters]\nK = { value = 1, range = [0, 5], band = [0.5, 1.5] }\n[loop]\nplant = \"K/s\"\nsweep = \"K\"\n";

        var ok = OperatingPointWriter.TryApply(original, "K", 3, Record(), "k.toml", out var text, out var error);

        Assert.False(ok);
        Assert.Null(text);
        Assert.Equal("k.toml:2:1: error: cannot save 3 as 'K': band [0.5, 1.5] does not contain the value 3 of 'K'", error!.ToString());
    }

    [Fact]
    public void Misuse_is_an_argument_error()
    {
        const string original = "[parameters]\nK = { value = 1, range = [0, 5] }\n[loop]\nplant = \"K/s\"\nsweep = \"K\"\n";

        Assert.Throws<ArgumentException>(() => OperatingPointWriter.Apply(original, "Q", 2, Record()));
        Assert.Throws<ArgumentOutOfRangeException>(() => OperatingPointWriter.Apply(original, "K", double.NaN, Record()));
        Assert.Throws<ArgumentException>(() => OperatingPointWriter.Apply(original, "K", 2, Record(values: [("K", 3.0)])));
    }

    [Fact]
    public void Any_finite_value_round_trips_exactly_and_only_the_value_token_changes()
    {
        const string original = "[parameters]\nK = { value = 1.0, range = [0, 5] } # keep\n[loop]\nplant = \"K/s\"\nsweep = \"K\"\n";
        var valueStart = original.IndexOf("1.0", StringComparison.Ordinal);

        Gen.Double.Where(double.IsFinite).Sample(value =>
        {
            var result = OperatingPointWriter.Apply(original, "K", value, Record());

            var plant = PlantFileReader.Parse(result, "x.toml");
            Assert.Equal(BitConverter.DoubleToInt64Bits(value == 0 ? value : value), BitConverter.DoubleToInt64Bits(plant.SweptParameter.Value));
            var afterValue = result.IndexOf(", range", valueStart, StringComparison.Ordinal);
            Assert.Equal(original[..valueStart], result[..valueStart]);
            Assert.StartsWith(original[(valueStart + 3)..], result[afterValue..], StringComparison.Ordinal);
        }, iter: 3000);
    }

    [Fact]
    public void A_document_is_written_back_as_utf8_with_its_bom()
    {
        var bytes = Encoding.UTF8.GetBytes("\uFEFF[parameters]\nK = { value = 1, range = [0, 5] }\n[loop]\nplant = \"K/s\"\nsweep = \"K\"\n");
        var document = PlantFileReader.ParseDocument(bytes, "x.toml");

        var saved = OperatingPointWriter.Apply(document, 2, Record());

        Assert.Equal(bytes.Take(3), saved.Take(3));
        Assert.Equal(bytes.Length - 1, Encoding.UTF8.GetBytes(document.Text).Length + 2);
        Assert.Equal(2.0, PlantFileReader.ParseDocument(saved, "x.toml").Plant.SweptParameter.Value, 0);
    }
}
