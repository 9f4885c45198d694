namespace TermLocus.App.Workbench;

/// <summary>Read a plant file and build its loop; answers <see cref="PlantLoaded"/> or <see cref="PlantLoadFailed"/>.</summary>
/// <param name="Path">The plant file.</param>
public sealed record LoadPlantEffect(string Path) : Effect;
