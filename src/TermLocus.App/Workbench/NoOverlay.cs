namespace TermLocus.App.Workbench;

/// <summary>Nothing over the main screen.</summary>
public sealed record NoOverlay : Overlay;
