namespace TermLocus.Core.Analysis;

/// <summary>Why a locus branch starts or ends where it does.</summary>
public enum LocusBranchEnd
{
    /// <summary>At an end of the traced parameter range.</summary>
    RangeLimit,

    /// <summary>
    /// Next to a value where P(s; p) drops in degree: the pole runs off to infinity there, so the branch is cut
    /// where it leaves the far limit (<see cref="TraceOptions.FarLimit"/>).
    /// </summary>
    DegreeDrop,
}
