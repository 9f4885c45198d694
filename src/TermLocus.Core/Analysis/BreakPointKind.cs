namespace TermLocus.Core.Analysis;

/// <summary>How branches behave at a break point, as |p| grows (moving away from the open-loop poles).</summary>
public enum BreakPointKind
{
    /// <summary>
    /// Branches meet and leave: fewer real poles after the point than before (real poles coalescing and splitting
    /// into a complex pair), or a multiple open-loop pole at p = 0, or a point off the real axis.
    /// </summary>
    Breakaway,

    /// <summary>Branches arrive and enter the real axis: more real poles after the point than before.</summary>
    BreakIn,
}
