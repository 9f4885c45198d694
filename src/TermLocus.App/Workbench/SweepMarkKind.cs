namespace TermLocus.App.Workbench;

/// <summary>What happens at a marked swept value.</summary>
public enum SweepMarkKind
{
    /// <summary>A pole crosses a spec limit.</summary>
    SpecBoundary,

    /// <summary>A pole crosses the imaginary axis: stability is gained or lost.</summary>
    StabilityCrossing,

    /// <summary>Branches meet on the real axis and leave it (or arrive).</summary>
    BreakPoint,
}
