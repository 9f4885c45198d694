namespace TermLocus.App.Workbench;

/// <summary>Where a save writes.</summary>
public enum SaveMode
{
    /// <summary>Into the plant file, only if it still holds the bytes loaded.</summary>
    IntoPlantFile,

    /// <summary>A new file under another name; refused if that file exists.</summary>
    NewFile,

    /// <summary>The plant file again at its path after it was deleted; if it is back, as <see cref="IntoPlantFile"/>.</summary>
    WriteAgain,
}
