namespace TermLocus.App.Workbench;

/// <summary>The box where the user types an exact swept value.</summary>
/// <param name="Text">What has been typed so far (raw; drawn through SafeText).</param>
/// <param name="Problem">Why the last attempt was refused, or null.</param>
public sealed record ValueEntryOverlay(string Text, string? Problem) : Overlay;
