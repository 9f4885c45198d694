namespace TermLocus.App.Workbench;

/// <summary>The plant library list with one entry selected.</summary>
/// <param name="Selected">Index into <see cref="LibraryState.Items"/>; 0 when the list is empty.</param>
public sealed record LibraryOverlay(int Selected) : Overlay;
