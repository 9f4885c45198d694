namespace TermLocus.App.Workbench;

/// <summary>A locus trace finished.</summary>
/// <param name="Analysis">The trace and its marks.</param>
public sealed record LocusTraced(LocusAnalysis Analysis) : Message;
