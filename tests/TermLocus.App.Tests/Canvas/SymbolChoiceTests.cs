using TermLocus.App.Canvas;

namespace TermLocus.App.Tests.Canvas;

// Locale precedence LC_ALL > LC_CTYPE > LANG for the character encoding: POSIX.1-2017, Base Definitions ch. 8
// "Environment Variables" (from memory).
public class SymbolChoiceTests
{
    private static Dictionary<string, string?> Env(params (string Name, string? Value)[] pairs) =>
        pairs.ToDictionary(p => p.Name, p => p.Value);

    [Theory]
    [InlineData("en_US.UTF-8", CanvasSymbols.Braille)]
    [InlineData("de_DE.utf8", CanvasSymbols.Braille)]
    [InlineData("C.UTF-8", CanvasSymbols.Braille)]
    [InlineData("C", CanvasSymbols.Ascii)]
    [InlineData("POSIX", CanvasSymbols.Ascii)]
    [InlineData("en_US.ISO-8859-1", CanvasSymbols.Ascii)]
    public void Lang_alone_decides_by_its_encoding(string lang, CanvasSymbols expected) =>
        Assert.Equal(expected, SymbolChoice.Detect(Env(("LANG", lang))));

    [Fact]
    public void LC_ALL_beats_LC_CTYPE_which_beats_LANG()
    {
        Assert.Equal(
            CanvasSymbols.Ascii,
            SymbolChoice.Detect(Env(("LC_ALL", "C"), ("LC_CTYPE", "en_US.UTF-8"), ("LANG", "en_US.UTF-8"))));
        Assert.Equal(
            CanvasSymbols.Braille,
            SymbolChoice.Detect(Env(("LC_CTYPE", "en_US.UTF-8"), ("LANG", "C"))));
    }

    [Fact]
    public void Empty_variables_are_skipped_and_nothing_set_means_ascii()
    {
        Assert.Equal(CanvasSymbols.Braille, SymbolChoice.Detect(Env(("LC_ALL", ""), ("LC_CTYPE", null), ("LANG", "C.UTF-8"))));
        Assert.Equal(CanvasSymbols.Ascii, SymbolChoice.Detect(Env()));
    }

    [Theory]
    [InlineData("braille", "C", CanvasSymbols.Braille)]
    [InlineData("ASCII", "en_US.UTF-8", CanvasSymbols.Ascii)]
    [InlineData("auto", "en_US.UTF-8", CanvasSymbols.Braille)]
    [InlineData(null, "C", CanvasSymbols.Ascii)]
    public void An_explicit_request_overrides_the_locale(string? requested, string lang, CanvasSymbols expected) =>
        Assert.Equal(expected, SymbolChoice.Detect(Env(("LANG", lang)), requested));

    [Fact]
    public void An_unknown_request_is_refused()
    {
        Assert.False(SymbolChoice.TryParseRequest("unicode", out _));
        Assert.Throws<ArgumentException>(() => SymbolChoice.Detect(Env(), "unicode"));
    }
}
