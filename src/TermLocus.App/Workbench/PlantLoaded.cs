namespace TermLocus.App.Workbench;

/// <summary>A plant file was read and its loop built.</summary>
/// <param name="Loaded">The plant and its loop.</param>
public sealed record PlantLoaded(LoadedPlant Loaded) : Message;
