namespace TermLocus.App.Workbench;

/// <summary>
/// Read a plant file and build its loop; answers <see cref="PlantLoaded"/> (with any recovery file found beside it
/// on a first open) or <see cref="PlantLoadFailed"/>.
/// </summary>
/// <param name="Path">The plant file.</param>
/// <param name="Keep">For a reload: the swept value to keep; null for a first open.</param>
public sealed record LoadPlantEffect(string Path, KeptValue? Keep = null) : Effect;
