using TermLocus.App.Canvas;

namespace TermLocus.App.Plot;

/// <summary>The characters that mark points on a plane plot. Every mark differs by shape, not only by colour.</summary>
/// <param name="OpenLoopPole">An open-loop pole.</param>
/// <param name="OpenLoopZero">An open-loop zero.</param>
/// <param name="CurrentPole">A closed-loop pole that meets the specs.</param>
/// <param name="CurrentPoleViolating">A closed-loop pole that breaks a spec.</param>
/// <param name="Marker">A cursor or picked point.</param>
/// <param name="DottedLine">What a dotted spec limit looks like, for the legend.</param>
public sealed record PlaneGlyphs(
    char OpenLoopPole, char OpenLoopZero, char CurrentPole, char CurrentPoleViolating, char Marker, string DottedLine)
{
    /// <summary>Unicode marks for braille plots.</summary>
    public static PlaneGlyphs Unicode { get; } = new('×', '○', '●', '▲', '◆', "⋯");

    /// <summary>Plain marks for ASCII plots; none of them is also a line character.</summary>
    public static PlaneGlyphs Ascii { get; } = new('x', 'o', '#', '!', '@', "..");

    /// <summary>The marks that go with <paramref name="symbols"/>.</summary>
    public static PlaneGlyphs For(CanvasSymbols symbols) => symbols == CanvasSymbols.Braille ? Unicode : Ascii;
}
