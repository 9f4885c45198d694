namespace TermLocus.App.Plot;

/// <summary>Which limit a <see cref="BoundaryCurve"/> draws; all are drawn alike, the kind feeds the legend.</summary>
public enum BoundaryKind
{
    /// <summary>A damping-ratio (ζ) limit.</summary>
    Damping,

    /// <summary>A decay-rate (σ) limit, including limits given as time to half or settling time.</summary>
    DecayRate,

    /// <summary>A natural-frequency (ωn) limit.</summary>
    NaturalFrequency,

    /// <summary>The z-plane unit circle (the stability boundary of a sampled loop).</summary>
    UnitCircle,
}
