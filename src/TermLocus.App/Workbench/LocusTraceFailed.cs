namespace TermLocus.App.Workbench;

/// <summary>A locus trace could not be computed.</summary>
/// <param name="Key">The inputs.</param>
/// <param name="Problem">What went wrong, one line.</param>
public sealed record LocusTraceFailed(TraceKey Key, string Problem) : Message;
