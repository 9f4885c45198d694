namespace TermLocus.Core.Plants;

/// <summary>How an attempt to save a file ended.</summary>
public enum SaveOutcome
{
    /// <summary>The new bytes were written and the file replaced.</summary>
    Saved,

    /// <summary>The file already held exactly these bytes; nothing was written.</summary>
    Unchanged,

    /// <summary>The file on disk differs from the one that was loaded; nothing was written.</summary>
    ChangedOnDisk,

    /// <summary>The file no longer exists; nothing was written.</summary>
    Missing,

    /// <summary>The file is read-only (or not writable by this user); nothing was written.</summary>
    ReadOnlyFile,

    /// <summary>The folder does not allow creating the temporary file; nothing was written.</summary>
    ReadOnlyFolder,

    /// <summary>A new file was asked for but one exists already; nothing was written.</summary>
    AlreadyExists,

    /// <summary>An I/O error stopped the save; the original file is untouched.</summary>
    Failed,
}

/// <summary>The result of <c>AtomicFileSaver.TrySave</c>.</summary>
/// <param name="Outcome">How the save ended.</param>
/// <param name="TargetPath">The file actually written or checked (symbolic links resolved).</param>
/// <param name="Message">One line for the user saying what happened and, on failure, what to do.</param>
public sealed record AtomicSaveResult(SaveOutcome Outcome, string TargetPath, string Message)
{
    /// <summary>True when the file now holds the new bytes (<see cref="SaveOutcome.Saved"/> or <see cref="SaveOutcome.Unchanged"/>).</summary>
    public bool Succeeded => Outcome is SaveOutcome.Saved or SaveOutcome.Unchanged;
}
