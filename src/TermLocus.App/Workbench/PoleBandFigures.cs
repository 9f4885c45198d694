using System.Numerics;

namespace TermLocus.App.Workbench;

/// <summary>
/// What one closed-loop pole does across the varied parameter's band (at the current swept value) and how fast it
/// moves with that parameter.
/// </summary>
/// <param name="Pole">The pole (root in the loop's own plane; for a pair the member with positive imaginary part).</param>
/// <param name="WorstDamping">The lowest ζ on the pole's trail across the band; null when no point has one.</param>
/// <param name="WorstDecayRate">The lowest decay rate σ (1/s) on the trail; null when no point has one.</param>
/// <param name="DampingPerPercent">How much ζ changes for +1 % of the varied parameter (first order); null when undefined.</param>
/// <param name="DecayRatePerPercent">How much σ (1/s) changes for +1 % of the varied parameter; null when undefined.</param>
/// <param name="NearMultipleRoot">True when the pole is (numerically) a multiple root, where no derivative exists.</param>
public sealed record PoleBandFigures(
    Complex Pole,
    double? WorstDamping,
    double? WorstDecayRate,
    double? DampingPerPercent,
    double? DecayRatePerPercent,
    bool NearMultipleRoot);
