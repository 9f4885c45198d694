namespace TermLocus.Core.Analysis;

/// <summary>
/// How finely <see cref="LocusTracer.Trace"/> samples the swept parameter.
/// </summary>
/// <param name="MaxStepFraction">
/// Largest allowed jump of a pole between two consecutive points of a branch, as a fraction of
/// max(<c>scale</c>, |s|) where <c>scale</c> is the trace's view scale (see <paramref name="Scale"/>) and |s| the smaller
/// distance of the two points from the origin. Dimensionless, in (0, 0.5]; default 0.015 (1.5 %).
/// </param>
/// <param name="MaxValues">
/// Cap on the number of parameter values sampled over the whole trace (each value gives one point per branch);
/// at least <paramref name="InitialIntervals"/> + 1. When the cap stops refinement the trace reports
/// <see cref="LocusTrace.Complete"/> = false.
/// </param>
/// <param name="InitialIntervals">Number of equal steps of the first, coarse sampling (in a warped parameter); 8 to 10 000.</param>
/// <param name="Scale">
/// The view scale in rad/s (&gt; 0), or null to take the largest magnitude of the open-loop poles and zeros
/// (affine families) or of the poles at the start of the range (other families); when those all lie within 1e-9 rad/s
/// of the origin, of the poles at the end of the range; failing that 1 rad/s.
/// </param>
/// <param name="FarLimit">
/// Where the parameter reaches a value at which the characteristic polynomial drops in degree, poles run off to
/// infinity; their branches are cut where the largest pole magnitude reaches <c>FarLimit × scale</c>. Above 1; default 50.
/// </param>
public sealed record TraceOptions(
    double MaxStepFraction = 0.015,
    int MaxValues = 4000,
    int InitialIntervals = 64,
    double? Scale = null,
    double FarLimit = 50.0)
{
    /// <summary>The default options.</summary>
    public static TraceOptions Default { get; } = new();

    /// <summary>Throws <see cref="ArgumentOutOfRangeException"/> when an option is outside its documented range.</summary>
    public void Validate()
    {
        if (!(MaxStepFraction > 0.0 && MaxStepFraction <= 0.5))
        {
            throw new ArgumentOutOfRangeException(nameof(MaxStepFraction), MaxStepFraction, "Must be in (0, 0.5].");
        }

        if (InitialIntervals < 8 || InitialIntervals > 10_000)
        {
            throw new ArgumentOutOfRangeException(nameof(InitialIntervals), InitialIntervals, "Must be in [8, 10000].");
        }

        if (MaxValues < InitialIntervals + 1)
        {
            throw new ArgumentOutOfRangeException(nameof(MaxValues), MaxValues, "Must be at least InitialIntervals + 1.");
        }

        if (Scale is { } s && !(s > 0.0 && double.IsFinite(s)))
        {
            throw new ArgumentOutOfRangeException(nameof(Scale), s, "Must be finite and positive.");
        }

        if (!(FarLimit > 1.0 && double.IsFinite(FarLimit)))
        {
            throw new ArgumentOutOfRangeException(nameof(FarLimit), FarLimit, "Must be finite and above 1.");
        }
    }
}
