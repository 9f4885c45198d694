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

    /// <summary>The trails across the band at the swept value, or null before they are computed.</summary>
    public BandAnalysis? Band { get; init; }

    /// <summary>The band-wide check at the swept value, or null while it runs.</summary>
    public BandCheck? Check { get; init; }

    /// <summary>Recent band checks by swept value.</summary>
    public RecentResults<double, BandCheck> Checks { get; init; } = RecentResults<double, BandCheck>.Empty;

    /// <summary>The swept value of the last band check asked for.</summary>
    public double? RequestedCheck { get; init; }

    /// <summary>The step response shown: the one for the current values once simulated, until then the last one
    /// (see <see cref="ResponseIsCurrent"/>); null before the first arrives or while the response is not shown.</summary>
    public ResponseView? Response { get; init; }

    /// <summary>Recent step responses by their inputs.</summary>
    public RecentResults<ResponseKey, ResponseView> Responses { get; init; } = RecentResults<ResponseKey, ResponseView>.Empty;

    /// <summary>The inputs of the last step response asked for.</summary>
    public ResponseKey? RequestedResponse { get; init; }

    /// <summary>The robust design of the swept value, or null while it is being made.</summary>
    public Designed? Design { get; init; }

    /// <summary>The inputs of the step response for the values shown.</summary>
    public ResponseKey ResponseKey => new(Loop.Key, Sweep.Value);

    /// <summary>True when <see cref="Response"/> is for the values shown.</summary>
    public bool ResponseIsCurrent => Response is { } r && r.Key.Equals(ResponseKey);

    /// <summary>True when the band check is still running for the swept value (a plant with a loop model only).</summary>
    public bool CheckPending => Check is null && Loaded.Model is not null;

    /// <summary>How the plant file on disk compares with the bytes loaded, as last checked.</summary>
    public FileOnDisk Disk { get; init; } = FileOnDisk.AsLoaded;

    /// <summary>True from asking for a save until its outcome arrives: our own write is not news about the file.</summary>
    public bool SaveInFlight { get; init; }

    /// <summary>A free file name beside the plant file for a save under another name, as last checked; null until checked.</summary>
    public string? SaveAsSuggestion { get; init; }

    /// <summary>The recovery file whose value was applied (deleted once the value is saved into the plant), or null.</summary>
    public string? AppliedRecovery { get; init; }

    /// <summary>The inputs of the last trace asked for, so a trace in flight (or one that failed) is not asked for again.</summary>
    public TraceKey? RequestedTrace { get; init; }

    /// <summary>The loop shown: <see cref="CurrentLoop"/>, or the nominal one.</summary>
    public CurrentLoop Loop => CurrentLoop ?? Workbench.CurrentLoop.Nominal(Loaded);

    /// <summary>True when a chosen value differs from the value in the file.</summary>
    public bool Unsaved => Sweep.Unsaved;

    /// <summary>True when <see cref="Locus"/> was traced for the loop shown (not left over from another place in the band).</summary>
    public bool LocusIsCurrent => Locus is { } locus && locus.Key.Equals(Loop.Key);
}
