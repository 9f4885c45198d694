using TermLocus.App.Text;

namespace TermLocus.App.Tests.Text;

public class SafeTextTests
{
    // The control sets are those of ECMA-48 (C0 0x00-0x1F, DEL 0x7F, C1 0x80-0x9F with 0x9B the one-byte CSI) and the
    // bidirectional controls of Unicode UAX #9 (common practice for terminal-safety filters).
    [Theory]
    [InlineData("plain title", "plain title")]
    [InlineData("esc \u001b[31mred", "esc ^[[31mred")]
    [InlineData("bell\u0007", "bell^G")]
    [InlineData("line\nbreak\r", "line^Jbreak^M")]
    [InlineData("tab\there", "tab here")]
    [InlineData("del\u007f", "del^?")]
    [InlineData("csi\u009b2J", "csi<U+009B>2J")]
    [InlineData("nel\u0085", "nel<U+0085>")]
    [InlineData("rlo\u202Eevil", "rlo<U+202E>evil")]
    [InlineData("isolate\u2066x\u2069", "isolate<U+2066>x<U+2069>")]
    [InlineData("mark\u200F", "mark<U+200F>")]
    [InlineData("ζ ωn ½ 日本", "ζ ωn ½ 日本")]
    public void Control_characters_become_visible(string input, string expected) =>
        Assert.Equal(expected, SafeText.Visible(input));

    [Fact]
    public void A_lone_surrogate_becomes_the_replacement_character() =>
        Assert.Equal("a\uFFFDb", SafeText.Visible("a\uD800b"));

    [Fact]
    public void Null_and_empty_are_empty()
    {
        Assert.Equal(string.Empty, SafeText.Visible(null));
        Assert.Equal(string.Empty, SafeText.Visible(string.Empty));
    }

    [Fact]
    public void Fit_cuts_by_terminal_columns_and_marks_the_cut()
    {
        Assert.Equal("abcd~", SafeText.Fit("abcdefgh", 5));
        Assert.Equal("日本~", SafeText.Fit("日本語のタイトル", 5)); // wide characters take two columns each
        Assert.Equal("short", SafeText.Fit("short", 5));
        Assert.Equal("^[[~", SafeText.Fit("\u001b[2J", 4));
    }
}
