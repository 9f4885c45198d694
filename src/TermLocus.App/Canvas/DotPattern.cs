namespace TermLocus.App.Canvas;

/// <summary>A dash pattern for lines, counted in dots along the line: <paramref name="On"/> dots drawn, then
/// <paramref name="Off"/> dots skipped. Dotted lines keep spec limits apart from branches without colour.</summary>
/// <param name="On">Dots drawn per period, at least 1.</param>
/// <param name="Off">Dots skipped per period, 0 for a solid line.</param>
public readonly record struct DotPattern(int On, int Off)
{
    /// <summary>Every dot.</summary>
    public static DotPattern Solid => new(1, 0);

    /// <summary>Every other dot.</summary>
    public static DotPattern Alternate => new(1, 1);

    /// <summary>One dot in three.</summary>
    public static DotPattern Sparse => new(1, 2);

    internal int Period => Math.Max(1, On) + Math.Max(0, Off);

    internal bool Draws(int step) => Off <= 0 || step % Period < Math.Max(1, On);
}
