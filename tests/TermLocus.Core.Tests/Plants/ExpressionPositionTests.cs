using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Plants;

/// <summary>
/// ExpressionText.Positions maps each decoded character to the line and column where it stands in the file,
/// through escapes and multi-line strings (TOML 1.0 specification, "String", for the decoding rules).
/// </summary>
public sealed class ExpressionPositionTests
{
    private const string Head = "[parameters]\nK = { value = 1, range = [0, 5] }\n[loop]\nsweep = \"K\"\n";

    private static ExpressionText PlantOf(string loopLine) => PlantFileReader.Parse(Head + loopLine, "x.toml").Loop.Plant!;

    [Fact]
    public void Plain_characters_map_to_consecutive_columns()
    {
        var plant = PlantOf("plant = \"1/(s+K)\"\n");

        Assert.Equal("1/(s+K)", plant.Text);
        Assert.Equal(Enumerable.Range(10, 8).Select(c => new SourcePosition(5, c)), plant.Positions);
    }

    [Fact]
    public void Escapes_map_every_decoded_unit_to_the_backslash()
    {
        // Columns: plant = "a\tb\u00e9c"  -> a 10, \t 11, b 13, \u00e9 14, c 20, closing quote 21.
        var plant = PlantOf("plant = \"a\\tb\\u00e9c\"\n");

        Assert.Equal("a\tb\u00e9c", plant.Text);
        Assert.Equal([10, 11, 13, 14, 20, 21], plant.Positions.Select(p => p.Column));
    }

    [Fact]
    public void An_astral_escape_gives_both_surrogates_the_backslash_column()
    {
        var plant = PlantOf("plant = \"\\U0001F600K\"\n");

        Assert.Equal("\U0001F600K", plant.Text);
        Assert.Equal([10, 10, 20, 21], plant.Positions.Select(p => p.Column));
    }

    [Fact]
    public void Literal_strings_keep_backslashes_as_characters()
    {
        var plant = PlantOf("plant = 'K\\s'\n");

        Assert.Equal("K\\s", plant.Text);
        Assert.Equal([10, 11, 12, 13], plant.Positions.Select(p => p.Column));
    }

    [Fact]
    public void A_multi_line_basic_string_drops_its_first_newline_and_line_continuations()
    {
        var plant = PlantOf("plant = \"\"\"\nK / \\\n    (s + 1)\"\"\"\n");

        Assert.Equal("K / (s + 1)", plant.Text);
        Assert.Equal(new SourcePosition(6, 1), plant.PositionOf(0));
        Assert.Equal(new SourcePosition(6, 3), plant.PositionOf(2));
        Assert.Equal(new SourcePosition(7, 5), plant.PositionOf(4));
        Assert.Equal(new SourcePosition(7, 12), plant.PositionOf(plant.Text.Length));
    }

    [Fact]
    public void A_multi_line_literal_string_with_crlf_keeps_lines_apart()
    {
        var plant = PlantOf("plant = '''\r\nK\r\n/ s'''\r\n");

        Assert.Equal("K\r\n/ s", plant.Text);
        Assert.Equal(new SourcePosition(6, 1), plant.PositionOf(0));
        Assert.Equal(new SourcePosition(7, 1), plant.PositionOf(3));
        Assert.Equal(new SourcePosition(7, 3), plant.PositionOf(5));
    }

    [Fact]
    public void Columns_count_utf16_units_of_earlier_characters_on_the_line()
    {
        var plant = PlantOf("plant = \"K\" # 😀 é\ncontroller = \"\U0001F600\" # not an expression error here\n");
        var controller = PlantFileReader.Parse(Head + "plant = \"K\"\ncontroller = \"é😀K\"\n", "x.toml").Loop.Controller!;

        Assert.Equal(new SourcePosition(5, 10), plant.PositionOf(0));
        Assert.Equal([15, 16, 16 + 2, 19], controller.Positions.Select(p => p.Column).Where((_, i) => i != 2));
    }
}
