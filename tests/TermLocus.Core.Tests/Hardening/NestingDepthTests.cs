using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Hardening;

/// <summary>
/// Values nested past the TOML parser's depth limit (64) get an error in the file's own terms at the bracket that
/// goes too deep, not the parser's advice about its options at 1:1 (plant-file design: errors name the line and
/// column of the offending character).
/// </summary>
public sealed class NestingDepthTests
{
    [Theory]
    [InlineData("deep = ", '[', ']')]
    [InlineData("deep = ", '{', '}')]
    public void Nesting_past_the_limit_is_reported_at_the_bracket_that_goes_too_deep(string prefix, char open, char close)
    {
        string inner = open == '{' ? string.Concat(Enumerable.Repeat("{a=", 100_000)) + "1" : new string(open, 100_000);
        string text = "title = \"x\"\n# a [comment] with { brackets\n" + prefix + inner + new string(close, 100_000) + "\n";

        var error = Assert.Throws<PlantFileException>(() => PlantFileReader.Parse(text, "deep.toml")).Error;

        int column = prefix.Length + 1 + (open == '{' ? 3 * 64 : 64);
        Assert.Equal(new SourcePosition(3, column), error.Position);
        Assert.Equal("arrays and inline tables nested too deeply (more than 64 levels)", error.Message);
    }
}
