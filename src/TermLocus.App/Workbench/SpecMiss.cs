using System.Numerics;

namespace TermLocus.App.Workbench;

/// <summary>One spec a closed-loop pole does not meet, as the workbench shows it.</summary>
/// <param name="SpecKey">The plant-file key of the spec, e.g. <c>min_damping</c>.</param>
/// <param name="Limit">The limit from the file, in the spec's unit.</param>
/// <param name="Actual">The pole's figure in the same unit, or null when it has none (time to half of a pole that
/// does not decay).</param>
/// <param name="Margin">Signed distance to the limit in the spec's unit, negative when violated (minus infinity when
/// the pole can never meet it).</param>
/// <param name="Pole">The pole that misses the spec.</param>
public sealed record SpecMiss(string SpecKey, double Limit, double? Actual, double Margin, Complex Pole)
{
    /// <summary>The margin relative to the limit, for ranking misses of different specs; minus infinity first.</summary>
    public double RelativeMargin => Limit == 0 ? Margin : Margin / Math.Abs(Limit);
}
