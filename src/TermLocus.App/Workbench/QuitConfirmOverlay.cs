namespace TermLocus.App.Workbench;

/// <summary>The question asked before quitting with an unsaved swept value.</summary>
public sealed record QuitConfirmOverlay : Overlay;
