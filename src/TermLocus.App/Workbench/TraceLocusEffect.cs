using TermLocus.Core.Analysis;

namespace TermLocus.App.Workbench;

/// <summary>Trace the locus for a set of inputs; answers <see cref="LocusTraced"/> or <see cref="LocusTraceFailed"/>.</summary>
/// <param name="Loaded">The plant and its loop.</param>
/// <param name="Key">The inputs (the plant and the other parameters' values).</param>
/// <param name="Family">The characteristic family at those values, or null for the plant's nominal one.</param>
public sealed record TraceLocusEffect(LoadedPlant Loaded, TraceKey Key, CharacteristicFamily? Family = null) : Effect;
