namespace TermLocus.App.Workbench;

/// <summary>A plant file was read and its loop built.</summary>
/// <param name="Loaded">The plant and its loop.</param>
public sealed record PlantLoaded(LoadedPlant Loaded) : Message
{
    /// <summary>For a reload: the swept value to keep, as asked.</summary>
    public KeptValue? Kept { get; init; }

    /// <summary>A recovery file found beside the plant file on a first open, or null.</summary>
    public RecoveryFile? Recovery { get; init; }
}
