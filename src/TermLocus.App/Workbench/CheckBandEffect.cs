namespace TermLocus.App.Workbench;

/// <summary>Check the band at a swept value; answers <see cref="BandCheck"/>. Only the newest one waiting is run.</summary>
/// <param name="Loaded">The plant and its loop model.</param>
/// <param name="SweptValue">The swept value.</param>
public sealed record CheckBandEffect(LoadedPlant Loaded, double SweptValue) : Effect;
