namespace TermLocus.App.Workbench;

/// <summary>
/// Everything the workbench shows, immutable. Only <see cref="Update"/> makes a new one; views only draw it.
/// </summary>
/// <param name="Library">The library folder and its files.</param>
/// <param name="Session">The open plant, or null before one is opened.</param>
/// <param name="View">Zoom and pan of the s-plane.</param>
/// <param name="Focus">The pane with keyboard focus.</param>
/// <param name="Overlay">What is drawn on top and takes the keys.</param>
/// <param name="Message">A message for the status line, or null.</param>
public sealed record WorkbenchState(
    LibraryState Library,
    PlantSession? Session,
    ViewState View,
    Pane Focus,
    Overlay Overlay,
    StatusMessage? Message)
{
    /// <summary>True when the step response is on screen (instead of the plane, or beside it in roomy layouts).</summary>
    public bool ShowsResponse { get; init; }

    /// <summary>True when a chosen value has not been saved to its plant file.</summary>
    public bool Unsaved => Session?.Unsaved ?? false;

    /// <summary>The state before anything is loaded.</summary>
    public static WorkbenchState Initial(string? libraryFolder) =>
        new(LibraryState.Unscanned(libraryFolder), null, ViewState.Fitted, Pane.Plane, Overlay.None, null);
}
