namespace TermLocus.App.Workbench;

/// <summary>Why a save wrote nothing and needs a choice from the user.</summary>
public enum SaveRefusal
{
    /// <summary>The plant file changed on disk since it was loaded.</summary>
    FileChanged,

    /// <summary>The plant file is gone.</summary>
    FileMissing,

    /// <summary>The file named for a save under another name exists already.</summary>
    TargetExists,
}
