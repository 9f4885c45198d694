using System.Collections.Immutable;
using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>
/// A loop checked at one set of values and across its tolerance box.
/// Poles are equivalent s-plane poles (rad/s); stability is judged in the loop's own plane.
/// </summary>
/// <param name="Values">Every parameter's value used (nominal, overridden where asked).</param>
/// <param name="Poles">Closed-loop poles at <paramref name="Values"/>, sorted by real part then imaginary part.</param>
/// <param name="InfinitePoles">Poles lost to infinity at these values (the characteristic polynomial dropped degree).</param>
/// <param name="HiddenPoles">Closed-loop poles hidden by a pole-zero cancellation in the loop (also in <paramref name="Poles"/>).</param>
/// <param name="Nominal">The spec report at <paramref name="Values"/>.</param>
/// <param name="Box">The tolerance box checked (the swept parameter excluded).</param>
/// <param name="Band">Per limit, its worst point over the box (the nominal point included).</param>
/// <param name="WorstDamping">Lowest ζ over the box and where, or null when there are no poles.</param>
/// <param name="WorstDecayRate">Lowest decay rate σ (1/s) over the box and where, or null when there are no poles.</param>
/// <param name="StableAcrossBand">True when every pole at every corner (and at the worst decay-rate point) is strictly stable.</param>
public sealed record LoopCheckResult(
    ImmutableDictionary<string, double> Values,
    ImmutableArray<Complex> Poles,
    int InfinitePoles,
    ImmutableArray<Complex> HiddenPoles,
    SpecReport Nominal,
    ToleranceBox Box,
    ImmutableArray<BandOutcome> Band,
    BandMinimum? WorstDamping,
    BandMinimum? WorstDecayRate,
    bool StableAcrossBand)
{
    /// <summary>
    /// The <c>max_overshoot_pct</c> limit judged on the simulated step response at <see cref="Values"/> themselves
    /// (<see cref="BandOutcome.At"/> empty), the nominal counterpart of its <see cref="Band"/> entry; null when the
    /// specs set no overshoot limit or there is no response to judge. <see cref="Nominal"/> holds pole limits only.
    /// </summary>
    public BandOutcome? NominalOvershoot { get; init; }

    /// <summary>
    /// How far rounding alone can move the poles at <see cref="Values"/>, relative to their magnitude (see
    /// <see cref="Algebra.RootUncertainty.RelativeSpread"/>): near 1e-15 for well-separated poles, large for high-order
    /// repeated or tightly clustered ones, whose digits then mean little; null when poles were lost to infinity or the
    /// characteristic polynomial is given with its roots.
    /// </summary>
    public double? PoleSpread { get; init; }

    /// <summary>True when <see cref="PoleSpread"/> is above <see cref="Algebra.RootUncertainty.WorthWarning"/>.</summary>
    public bool PolesIllConditioned => PoleSpread > Algebra.RootUncertainty.WorthWarning;

    /// <summary>True when every limit holds across the box and the loop is stable everywhere in it.</summary>
    public bool Passed => StableAcrossBand && Band.All(b => b.Met);

    /// <summary>The limits violated somewhere in the box, worst relative margin first.</summary>
    public ImmutableArray<BandOutcome> Violated => Band.Where(b => !b.Met).OrderBy(b => b.WorstRelativeMargin).ToImmutableArray();
}
