namespace TermLocus.App.Workbench;

/// <summary>
/// How the user has moved the s-plane view away from the fitted one, independent of the window size: a zoom in
/// whole steps and a pan in fractions of the fitted view. Resizing keeps both; fitting resets them.
/// </summary>
/// <param name="ZoomSteps">Zoom steps in (&gt; 0) or out (&lt; 0) from the fitted view.</param>
/// <param name="PanRight">How far the centre has moved right, in widths of the fitted view.</param>
/// <param name="PanUp">How far the centre has moved up, in heights of the fitted view.</param>
public sealed record ViewState(int ZoomSteps, double PanRight, double PanUp)
{
    /// <summary>Magnification of one zoom step.</summary>
    public const double ZoomStepFactor = 1.5;

    /// <summary>Zoom steps allowed either way (1.5^16 is about 650).</summary>
    public const int MaxZoomSteps = 16;

    /// <summary>One pan step, as a fraction of what is on screen.</summary>
    public const double PanStepFraction = 0.25;

    /// <summary>The fitted view.</summary>
    public static ViewState Fitted { get; } = new(0, 0, 0);

    /// <summary>Magnification relative to the fitted view.</summary>
    public double ZoomFactor => Math.Pow(ZoomStepFactor, ZoomSteps);
}
