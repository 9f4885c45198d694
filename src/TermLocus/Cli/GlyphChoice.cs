using TermLocus.App.Canvas;
using TermLocus.App.Text;

namespace TermLocus.Cli;

/// <summary>Unicode symbols in a UTF-8 locale, ASCII words otherwise (the same rule as the plot's symbols).</summary>
internal static class GlyphChoice
{
    /// <summary>The glyphs for this environment.</summary>
    public static Glyphs For(CliContext context) =>
        SymbolChoice.FromLocale(context.Environment) == CanvasSymbols.Braille ? Glyphs.Unicode : Glyphs.Ascii;
}
