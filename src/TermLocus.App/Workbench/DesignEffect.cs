namespace TermLocus.App.Workbench;

/// <summary>Find the feasible intervals and the recommended value of the swept parameter; answers <see cref="Designed"/>.</summary>
/// <param name="Loaded">The plant and its loop model.</param>
public sealed record DesignEffect(LoadedPlant Loaded) : Effect;
