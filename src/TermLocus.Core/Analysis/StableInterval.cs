namespace TermLocus.Core.Analysis;

/// <summary>
/// A range of the swept value over which every closed-loop pole has a negative real part. Ends are the exact
/// values where a pole reaches the imaginary axis or passes through infinity (there the loop is only marginally
/// stable), or the ends of the analysed range.
/// </summary>
/// <param name="From">Lower end (&lt; To).</param>
/// <param name="To">Upper end.</param>
public sealed record StableInterval(double From, double To);
