namespace TermLocus.App.Workbench;

/// <summary>The open plant and everything derived from it.</summary>
/// <param name="Loaded">The plant and its loop.</param>
/// <param name="Sweep">The swept value being looked at.</param>
/// <param name="Varied">Where the varied (toleranced) parameter stands in its band.</param>
/// <param name="Locus">The traced locus shown: the one for <see cref="Loop"/> once traced, until then the one shown
/// before (see <see cref="LocusIsCurrent"/>); null before the first trace arrives.</param>
/// <param name="Cache">Recent traces by their inputs.</param>
/// <param name="Poles">The closed-loop poles at the swept value and the varied parameter's place.</param>
/// <param name="SelectedPole">Index of the selected pole-table row, &gt;= 0.</param>
public sealed record PlantSession(
    LoadedPlant Loaded,
    SweepState Sweep,
    VariedPosition Varied,
    LocusAnalysis? Locus,
    LocusCache Cache,
    PoleSnapshot Poles,
    int SelectedPole)
{
    /// <summary>The loop at the varied parameter's place in its band (nominal until stepped).</summary>
    public CurrentLoop? CurrentLoop { get; init; }

    /// <summary>The band at the swept value (check and trails), or null before it is computed.</summary>
    public BandAnalysis? Band { get; init; }

    /// <summary>The inputs of the last trace asked for, so a trace in flight (or one that failed) is not asked for again.</summary>
    public TraceKey? RequestedTrace { get; init; }

    /// <summary>The loop shown: <see cref="CurrentLoop"/>, or the nominal one.</summary>
    public CurrentLoop Loop => CurrentLoop ?? Workbench.CurrentLoop.Nominal(Loaded);

    /// <summary>True when a chosen value differs from the value in the file.</summary>
    public bool Unsaved => Sweep.Unsaved;

    /// <summary>True when <see cref="Locus"/> was traced for the loop shown (not left over from another place in the band).</summary>
    public bool LocusIsCurrent => Locus is { } locus && locus.Key.Equals(Loop.Key);
}
