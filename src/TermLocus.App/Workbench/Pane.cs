namespace TermLocus.App.Workbench;

/// <summary>The panes of the main screen that can take keyboard focus, in Tab order.</summary>
public enum Pane
{
    /// <summary>The s-plane: ↑/↓ pan.</summary>
    Plane,

    /// <summary>The pole table: ↑/↓ select a pole.</summary>
    Poles,
}
