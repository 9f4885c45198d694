namespace TermLocus.Tests.Cli;

public class TerminalSafetyTests
{
    // OSC 52 (write the clipboard), an erase-screen CSI, a C1 CSI (0x9B) and a bidi override (common practice: the
    // sequences terminals act on, ECMA-48 and the Unicode bidi controls).
    private const string Hostile = "\\u001b]52;c;ZXZpbA==\\u0007\\u001b[2J\\u009b31m\\u202eevil";

    private static string PlantWithTitle() => RepoFiles.TempPlant($$"""
        title = "{{Hostile}}"
        note = "{{Hostile}}"
        [parameters]
        K = { value = 1.0, range = [0.0, 20.0], unit = "{{Hostile}}" }
        [loop]
        plant = "K / (s*(s + 1)*(s + 2))"
        sweep = "K"
        [specs]
        min_damping = 0.3
        """);

    [Theory]
    [InlineData("check")]
    [InlineData("analyze")]
    [InlineData("plot")]
    [InlineData("response")]
    public void No_control_character_from_a_plant_file_reaches_stdout(string verb)
    {
        var (code, stdout, stderr) = CliRunner.Run(verb, PlantWithTitle());
        Assert.True(code is 0 or 1, stderr);
        foreach (char c in stdout)
        {
            bool control = (c < 0x20 && c != '\n') || (c >= 0x7F && c <= 0x9F) || (c >= '\u202A' && c <= '\u202E') || (c >= '\u2066' && c <= '\u2069');
            Assert.False(control, $"{verb} printed U+{(int)c:X4}");
        }
    }

    [Fact]
    public void Json_escapes_control_characters_instead_of_printing_them()
    {
        var (_, stdout, _) = CliRunner.Run("check", PlantWithTitle(), "--json");
        Assert.DoesNotContain('\u001b', stdout);
        Assert.DoesNotContain('\u009b', stdout);
        Assert.Contains("\\u001B", stdout, StringComparison.OrdinalIgnoreCase);
    }
}
