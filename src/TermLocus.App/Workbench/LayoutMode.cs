namespace TermLocus.App.Workbench;

/// <summary>How the screen is laid out for its size.</summary>
public enum LayoutMode
{
    /// <summary>Below the minimum: only a message (and q) remain.</summary>
    TooSmall,

    /// <summary>80x24 and similar: plane and side panel on top, pole table, status lines.</summary>
    Compact,

    /// <summary>Large windows: as compact, with the legend and the library list in the side column.</summary>
    Roomy,
}
