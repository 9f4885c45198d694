namespace TermLocus.App.Workbench;

/// <summary>
/// Where a key binding applies. The workbench looks a key up in the scope of what is on top (an overlay, else the
/// focused pane, then the main screen), then in <see cref="Everywhere"/>.
/// </summary>
public enum Scope
{
    /// <summary>On every screen, overlays included.</summary>
    Everywhere,

    /// <summary>The main screen with no overlay open, whichever pane has focus.</summary>
    Main,

    /// <summary>The main screen while the s-plane has focus (checked before <see cref="Main"/>).</summary>
    PlanePane,

    /// <summary>The main screen while the pole table has focus (checked before <see cref="Main"/>).</summary>
    PolesPane,

    /// <summary>The help overlay.</summary>
    Help,

    /// <summary>The plant library overlay.</summary>
    Library,

    /// <summary>The value-entry box.</summary>
    ValueEntry,

    /// <summary>The save dialog (name and note of the operating point).</summary>
    SaveDialog,

    /// <summary>The choice offered when a save is refused because the plant file changed on disk or is gone.</summary>
    SaveConflict,

    /// <summary>The box to type the file name of a save under another name.</summary>
    SaveAs,

    /// <summary>The choice offered when a plant is opened and a recovery file lies beside it.</summary>
    Recovery,

    /// <summary>The question asked before quitting with an unsaved value.</summary>
    QuitConfirm,
}
