using System.Collections.Immutable;
using TermLocus.Core.Analysis;

namespace TermLocus.App.Workbench;

/// <summary>
/// The band at one swept value: the band-wide check (the one <c>termlocus check</c> runs: corners and interior
/// search of every toleranced parameter) and the trails the closed-loop poles draw as the varied parameter crosses
/// its band. Depends on the swept value only, so stepping the varied parameter reuses it.
/// </summary>
/// <param name="SweptValue">The swept value it was computed at.</param>
/// <param name="Parameter">The varied parameter the trails follow, or null.</param>
/// <param name="Trails">One path per pole, each ordered by the varied parameter's value, roots in the loop's plane.</param>
/// <param name="VariedFamily">The characteristic polynomial as a function of the varied parameter at this swept
/// value (for sensitivities), or null.</param>
/// <param name="Check">The band-wide check, or null when it could not be run (see <paramref name="Problem"/>) or the
/// plant was not built from a file.</param>
/// <param name="Problem">Why the check failed to run, or null.</param>
public sealed record BandAnalysis(
    double SweptValue,
    string? Parameter,
    ImmutableArray<ImmutableArray<LocusPoint>> Trails,
    CharacteristicFamily? VariedFamily,
    LoopCheckResult? Check,
    string? Problem)
{
    /// <summary>No band information (a hand-built plant without a loop model).</summary>
    public static BandAnalysis None(double sweptValue) => new(sweptValue, null, [], null, null, null);
}
