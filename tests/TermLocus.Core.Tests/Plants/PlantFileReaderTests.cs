using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Plants;

public sealed class PlantFileReaderTests
{
    private const double Exact = 0;
    private const double Rounding = 1e-15;

    // The example of docs plant-file.md "The plant file (TOML 1.0)", copied verbatim.
    private const string DesignExample = """
        # Invented example: spindle speed loop on a lathe test bench.
        title = "Spindle speed loop, bench 3"
        note = "Free text shown in the app."

        [parameters]
        Kc  = { value = 0.8, range = [0.0, 20.0], unit = "A/(rad/s)", note = "speed controller gain" }
        Kt  = 0.9
        J   = { value = 0.035, unit = "kg*m^2" }
        B   = { value = 0.012, tolerance_pct = 25, unit = "N*m*s/rad", note = "bearing drag, higher when cold" }
        tau = { value = 0.004, band = [0.003, 0.006], unit = "s" }

        [loop]
        plant      = "Kt / ((J*s + B) * (tau*s + 1))"
        controller = "Kc * (s + 20) / s"     # default "1"
        sensor     = "1"                     # feedback path, default "1"
        feedback   = "negative"              # or "positive"; default "negative"
        sweep = "Kc"
        vary  = "B"

        [specs]
        min_damping = 0.6
        max_time_to_half = 0.05
        max_natural_frequency = 400

        [[operating_points]]
        name = "first tune"
        saved = 2026-11-30T14:05:00Z
        by = "user@host"
        values = { Kc = 0.8 }
        verdict = "meets all specs across the band (worst ζ 0.64 at B -25 %)"
        note = ""
        """;

    [Fact]
    public void The_design_example_reads_into_the_expected_records()
    {
        var plant = PlantFileReader.Parse(DesignExample, "spindle.toml");

        Assert.Equal("Spindle speed loop, bench 3", plant.Title);
        Assert.Equal(["Kc", "Kt", "J", "B", "tau"], plant.Parameters.Select(p => p.Name));
        var kc = plant.SweptParameter;
        Assert.Equal(0.8, kc.Value, Exact);
        Assert.Equal(new Interval(0.0, 20.0), kc.Range);
        Assert.Equal("A/(rad/s)", kc.Unit);
        Assert.Equal(new SourcePosition(6, 1), kc.Location);
        Assert.Equal(0.9, plant.FindParameter("Kt")!.Value, Exact);

        // tolerance_pct = 25 of 0.012 is ±0.003 (plant-file.md: "±10 % of value" rule).
        var b = plant.FindParameter("B")!.Band!.Value;
        Assert.Equal(0.009, b.Low, Rounding);
        Assert.Equal(0.015, b.High, Rounding);
        Assert.Equal(new Interval(0.003, 0.006), plant.FindParameter("tau")!.Band);
    }

    [Fact]
    public void The_design_example_loop_specs_and_operating_point_are_kept()
    {
        var plant = PlantFileReader.Parse(DesignExample, "spindle.toml");

        Assert.Equal("Kt / ((J*s + B) * (tau*s + 1))", plant.Loop.Plant!.Text);
        Assert.Equal("Kc * (s + 20) / s", plant.Loop.Controller!.Text);
        Assert.Equal(FeedbackSign.Negative, plant.Loop.Feedback);
        Assert.Null(plant.Loop.Characteristic);
        Assert.Equal(("Kc", "B"), (plant.Loop.Sweep, plant.Loop.Vary));
        Assert.Equal(new Specs(MinDamping: 0.6, MaxTimeToHalfSeconds: 0.05, MaxNaturalFrequency: 400), plant.Specs);
        var point = Assert.Single(plant.OperatingPoints);
        Assert.Equal("first tune", point.Name);
        Assert.Equal(new DateTimeOffset(2026, 11, 30, 14, 5, 0, TimeSpan.Zero), point.SavedUtc);
        Assert.Equal(0.8, point.Values["Kc"], Exact);
        Assert.Contains("ζ 0.64", point.Verdict, StringComparison.Ordinal);
    }

    [Fact]
    public void Optional_keys_take_their_documented_defaults()
    {
        const string text = "[parameters]\nK = { value = 2, range = [0, 5] }\n[loop]\nplant = \"1/s\"\nsweep = \"K\"\n";

        var plant = PlantFileReader.Parse(text, "/rigs/bench-7.toml");

        Assert.Equal("bench-7", plant.Title);
        Assert.Equal(string.Empty, plant.Note);
        Assert.Null(plant.Loop.Controller);
        Assert.Null(plant.Loop.Sensor);
        Assert.Null(plant.Loop.Vary);
        Assert.Equal(FeedbackSign.Negative, plant.Loop.Feedback);
        Assert.Equal(Specs.None, plant.Specs);
        Assert.Empty(plant.OperatingPoints);
        Assert.Equal(2.0, plant.SweptParameter.Value, Exact);
    }

    [Fact]
    public void A_characteristic_positive_feedback_delay_and_sample_time_are_read()
    {
        const string text = "[parameters]\nK = { value = 1, range = [0, 5] }\n[loop]\ncharacteristic = \"s^2 + K\"\n"
            + "feedback = \"positive\"\nsweep = \"K\"\ndelay = 0\nsample_time = 0.001\n";

        var loop = PlantFileReader.Parse(text, "x.toml").Loop;

        Assert.Equal("s^2 + K", loop.Characteristic!.Text);
        Assert.Null(loop.Plant);
        Assert.Equal(FeedbackSign.Positive, loop.Feedback);
        Assert.Equal(0.0, loop.DelaySeconds!.Value, Exact);
        Assert.Equal(0.001, loop.SampleTimeSeconds!.Value, Exact);
    }

    // The default span is our own documented rule (Plant.SweepRange), not a textbook value.
    [Theory]
    [InlineData("K = 2", 0, 4)]
    [InlineData("K = -3", -6, 0)]
    [InlineData("K = 0", 0, 1)]
    [InlineData("K = { value = 2, range = [1, 9] }", 1, 9)]
    public void The_sweep_range_is_the_files_range_or_zero_to_twice_the_value(string parameter, double low, double high)
    {
        var plant = PlantFileReader.Parse($"[parameters]\n{parameter}\n[loop]\nplant = \"K/s\"\nsweep = \"K\"\n", "x.toml");

        Assert.Equal(new Interval(low, high), plant.SweepRange);
    }

    [Fact]
    public void A_leading_byte_order_mark_is_ignored_and_does_not_shift_columns()
    {
        var plant = PlantFileReader.Parse("\uFEFF[parameters]\nK = { value = 1, range = [0, 5] }\n[loop]\nplant = \"1/s\"\nsweep = \"K\"\n", "x.toml");

        Assert.Equal(new SourcePosition(4, 10), plant.Loop.Plant!.PositionOf(0));
    }

    [Fact]
    public void A_missing_file_is_a_located_error_not_an_IO_exception()
    {
        var path = Path.Combine(Path.GetTempPath(), "termlocus-no-such-" + Guid.NewGuid().ToString("N") + ".toml");

        Assert.False(PlantFileReader.TryRead(path, out var plant, out var error));

        Assert.Null(plant);
        Assert.Equal($"{path}:1:1: error: no such file", error!.ToString());
    }

    [Fact]
    public void A_folder_is_refused_with_a_located_error()
    {
        var error = Assert.Throws<PlantFileException>(() => PlantFileReader.Read(Path.GetTempPath())).Error;

        Assert.Equal("this is a folder, not a plant file", error.Message);
    }

    [Fact]
    public void Read_document_keeps_bytes_hash_bom_and_newline_style()
    {
        var text = "\uFEFFtitle = \"t\"\r\n[parameters]\r\nK = { value = 1, range = [0, 5] }\r\n[loop]\r\nplant = \"1/s\"\r\nsweep = \"K\"\r\n";
        var bytes = System.Text.Encoding.UTF8.GetBytes(text);

        var document = PlantFileReader.ParseDocument(bytes, "x.toml");

        Assert.True(document.HasBom);
        Assert.Equal("\r\n", document.NewLine);
        Assert.Equal(text[1..], document.Text);
        Assert.Equal(bytes, document.Bytes.ToArray());

        // SHA-256 from the .NET library, an implementation independent of the reader.
        Assert.Equal(System.Security.Cryptography.SHA256.HashData(bytes), document.Sha256.ToArray());
    }
}
