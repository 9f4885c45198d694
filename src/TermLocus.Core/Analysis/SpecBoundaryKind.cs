namespace TermLocus.Core.Analysis;

/// <summary>The s-plane boundary a pole crosses.</summary>
public enum SpecBoundaryKind
{
    /// <summary>The constant-damping lines ζ = limit (rays from the origin at ±acos(ζ) from the negative real axis).</summary>
    MinDamping,

    /// <summary>The vertical line σ = limit, i.e. Re s = −limit.</summary>
    MinDecayRate,

    /// <summary>The circle |s| = limit, crossed by a pole that becomes too slow or fast enough.</summary>
    MinNaturalFrequency,

    /// <summary>The circle |s| = limit, crossed by a pole that becomes too fast or slow enough.</summary>
    MaxNaturalFrequency,
}
