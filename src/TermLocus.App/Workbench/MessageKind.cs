namespace TermLocus.App.Workbench;

/// <summary>How much a status message matters.</summary>
public enum MessageKind
{
    /// <summary>News: a file opened, a value saved.</summary>
    Info,

    /// <summary>Something the user should notice: a value outside the range, nothing to save.</summary>
    Warning,

    /// <summary>Something failed: a file did not load or save.</summary>
    Error,
}
