namespace TermLocus.Core.Analysis;

/// <summary>Which way a pole crosses the imaginary axis as the swept value increases.</summary>
public enum AxisCrossingDirection
{
    /// <summary>Into the right half-plane (towards instability).</summary>
    IntoRightHalfPlane,

    /// <summary>Into the left half-plane (towards stability).</summary>
    IntoLeftHalfPlane,

    /// <summary>The pole touches the axis (a multiple root there, or it moves along it).</summary>
    Touching,
}
