using System.Collections.Immutable;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The traced root locus of a characteristic family over [<see cref="From"/>, <see cref="To"/>].
/// Between two values at which P(s; p) drops in degree there is one branch per root, so the branch count of each
/// such piece equals the degree there; the whole trace may hold several pieces.
/// </summary>
/// <param name="From">Lowest traced value of the swept parameter.</param>
/// <param name="To">Highest traced value of the swept parameter (&gt; From).</param>
/// <param name="Scale">The view scale used for the step bound, rad/s (&gt; 0).</param>
/// <param name="MaxStepFraction">The step bound used, as in <see cref="TraceOptions.MaxStepFraction"/>.</param>
/// <param name="Branches">The branches, grouped by piece in increasing value, each piece's branches in the order of
/// its first poles (by real part, then imaginary part).</param>
/// <param name="DegreeDrops">Values inside [From, To] where P(s; p) drops in degree, ascending.</param>
/// <param name="ValueCount">Number of parameter values sampled in all.</param>
/// <param name="Complete">True when every drawn segment meets the step bound; false when the value cap or the
/// finest allowed parameter step stopped refinement somewhere.</param>
public sealed record LocusTrace(
    double From,
    double To,
    double Scale,
    double MaxStepFraction,
    ImmutableArray<LocusBranch> Branches,
    ImmutableArray<double> DegreeDrops,
    int ValueCount,
    bool Complete)
{
    /// <summary>
    /// The largest jump allowed between consecutive branch points a and b:
    /// <c>MaxStepFraction × max(Scale, min(|a|, |b|))</c>, rad/s.
    /// </summary>
    public double AllowedStep(System.Numerics.Complex a, System.Numerics.Complex b) =>
        MaxStepFraction * Math.Max(Scale, Math.Min(a.Magnitude, b.Magnitude));
}
