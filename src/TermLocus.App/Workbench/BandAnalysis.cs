using System.Collections.Immutable;
using TermLocus.Core.Analysis;

namespace TermLocus.App.Workbench;

/// <summary>
/// The trails the closed-loop poles draw as the varied parameter crosses its band, at one swept value. Cheap (a few
/// dozen root findings); depends on the swept value and the varied parameter only, so stepping the varied parameter
/// reuses it.
/// </summary>
/// <param name="SweptValue">The swept value it was computed at.</param>
/// <param name="Parameter">The varied parameter the trails follow, or null.</param>
/// <param name="Trails">One path per pole, each ordered by the varied parameter's value, roots in the loop's plane.</param>
/// <param name="VariedFamily">The characteristic polynomial as a function of the varied parameter at this swept
/// value (for sensitivities), or null.</param>
public sealed record BandAnalysis(
    double SweptValue,
    string? Parameter,
    ImmutableArray<ImmutableArray<LocusPoint>> Trails,
    CharacteristicFamily? VariedFamily)
{
    /// <summary>No trails (no varied parameter, or a hand-built plant without a loop model).</summary>
    public static BandAnalysis None(double sweptValue) => new(sweptValue, null, [], null);
}
