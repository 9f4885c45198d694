using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Hardening;

/// <summary>
/// A time limit so small that its decay rate ln2/T or 4/T overflows (T = 5e-324, the smallest double: 4/T is past
/// 1.8e308, IEEE 754 binary64, common practice) must be refused where it is written, or the required decay rate shown
/// on the screen would be infinite.
/// </summary>
public sealed class TinyTimeLimitTests
{
    private const string Text = """
        # Invented example for a test: a time limit at the bottom of the double range.
        [parameters]
        K = { value = 1.0, range = [0.0, 10.0] }

        [loop]
        plant = "K / (s + 1)"
        sweep = "K"

        [specs]
        {0} = {1}
        """;

    [Theory]
    [InlineData("max_time_to_half", "5e-324")]
    [InlineData("max_settling_time", "1e-310")]
    public void A_time_limit_whose_decay_rate_overflows_is_refused_where_it_is_written(string key, string value)
    {
        var text = Text.Replace("{0}", key, StringComparison.Ordinal).Replace("{1}", value, StringComparison.Ordinal);

        var error = Assert.Throws<PlantFileException>(() => PlantFileReader.Parse(text, "tiny.toml")).Error;

        Assert.Equal(new SourcePosition(10, key.Length + 4), error.Position);
        Assert.Contains("at least 1e-300 s", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void The_smallest_accepted_time_limit_gives_a_finite_required_decay_rate()
    {
        var text = Text.Replace("{0}", "max_settling_time", StringComparison.Ordinal).Replace("{1}", "1e-300", StringComparison.Ordinal);

        var plant = PlantFileReader.Parse(text, "tiny.toml");

        // 4 / 1e-300 = 4e300 1/s (the 2 % settling estimate 4/σ, common practice), finite.
        Assert.Equal(4e300, SpecCheck.RequiredDecayRate(plant.Specs)!.Value, 4e300 * 1e-12);
    }
}
