namespace TermLocus.App.Plot;

/// <summary>What a plane plot draws besides the scene.</summary>
/// <param name="Axes">The real and imaginary axes with tick marks.</param>
/// <param name="Grid">Faint dots where ticks cross (braille only).</param>
/// <param name="TickLabels">Tick numbers along the bottom and left edges.</param>
public sealed record PlaneRenderOptions(bool Axes = true, bool Grid = true, bool TickLabels = true)
{
    /// <summary>Axes, grid and labels.</summary>
    public static PlaneRenderOptions Default { get; } = new();

    /// <summary>The scene alone.</summary>
    public static PlaneRenderOptions SceneOnly { get; } = new(Axes: false, Grid: false, TickLabels: false);
}
