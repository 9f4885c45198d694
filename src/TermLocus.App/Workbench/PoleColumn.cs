namespace TermLocus.App.Workbench;

/// <summary>The figure columns of the pole table, in the order they are dropped last to first.</summary>
internal enum PoleColumn
{
    /// <summary>ζ.</summary>
    Damping,

    /// <summary>ωn, rad/s.</summary>
    NaturalFrequency,

    /// <summary>σ, 1/s.</summary>
    DecayRate,

    /// <summary>Time to half (or to double), s.</summary>
    Time,

    /// <summary>ωd, rad/s.</summary>
    DampedFrequency,
}
