namespace TermLocus.App.Workbench;

/// <summary>The open plant and everything derived from it.</summary>
/// <param name="Loaded">The plant and its loop.</param>
/// <param name="Sweep">The swept value being looked at.</param>
/// <param name="Varied">Where the toleranced parameter stands (nominal for now).</param>
/// <param name="Locus">The traced locus for the current other values, or null while it is being traced.</param>
/// <param name="Cache">Recent traces by their inputs.</param>
/// <param name="Poles">The closed-loop poles at the swept value.</param>
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
    /// <summary>True when the swept value differs from the value in the file.</summary>
    public bool Unsaved => Sweep.Unsaved;
}
