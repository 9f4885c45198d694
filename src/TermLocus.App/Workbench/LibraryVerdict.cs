namespace TermLocus.App.Workbench;

/// <summary>How a plant of the library fares at its saved values.</summary>
public enum LibraryVerdict
{
    /// <summary>Every closed-loop pole meets every spec.</summary>
    Pass,

    /// <summary>At least one spec is violated.</summary>
    Fail,

    /// <summary>The file could not be read or its loop could not be built.</summary>
    Error,
}
