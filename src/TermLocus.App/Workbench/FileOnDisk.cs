namespace TermLocus.App.Workbench;

/// <summary>How the open plant file on disk compares with the bytes that were loaded (by SHA-256, as saving checks).</summary>
public enum FileOnDisk
{
    /// <summary>The file holds exactly the bytes loaded (or saved) last.</summary>
    AsLoaded,

    /// <summary>Another program wrote or replaced the file since it was loaded.</summary>
    Changed,

    /// <summary>The file is gone: deleted, or moved away.</summary>
    Missing,
}
