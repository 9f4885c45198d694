namespace TermLocus.App.Workbench;

/// <summary>The figure columns of the pole table.</summary>
internal enum PoleColumn
{
    /// <summary>ζ.</summary>
    Damping,

    /// <summary>The lowest ζ of the pole across the varied parameter's band.</summary>
    WorstDamping,

    /// <summary>ωn, rad/s.</summary>
    NaturalFrequency,

    /// <summary>σ, 1/s.</summary>
    DecayRate,

    /// <summary>The lowest σ of the pole across the varied parameter's band, 1/s.</summary>
    WorstDecayRate,

    /// <summary>Time to half (or to double), s.</summary>
    Time,

    /// <summary>ωd, rad/s.</summary>
    DampedFrequency,

    /// <summary>Change of ζ for +1 % of the varied parameter.</summary>
    DampingPerPercent,

    /// <summary>Change of σ (1/s) for +1 % of the varied parameter.</summary>
    DecayRatePerPercent,
}
