using System.Collections.Immutable;

namespace TermLocus.Core.Analysis;

/// <summary>One point of the band a design is checked at, with its characteristic family in the swept parameter.</summary>
/// <param name="Toleranced">The toleranced parameters' values there, by name.</param>
/// <param name="IsCorner">True for a corner of the box, false for the nominal point.</param>
/// <param name="Family">The characteristic polynomial as a function of the swept value at this point.</param>
internal sealed record DesignPoint(ImmutableDictionary<string, double> Toleranced, bool IsCorner, CharacteristicFamily Family);
