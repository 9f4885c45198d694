namespace TermLocus.App.Canvas;

/// <summary>
/// What drew a cell, so a view can colour it. The numeric order is the priority: when two layers share a cell the
/// larger value wins (a pole marker beats a label, a label beats a branch, a branch beats the axes).
/// </summary>
public enum CellLayer : byte
{
    /// <summary>Nothing drawn.</summary>
    None = 0,

    /// <summary>Faint grid dots at tick positions.</summary>
    Grid,

    /// <summary>The real and imaginary axes and their ticks.</summary>
    Axis,

    /// <summary>A spec limit: ζ line, decay-rate line, ωn arc, unit circle.</summary>
    SpecBoundary,

    /// <summary>Where poles wander across the tolerance band (drawn dimmer than branches).</summary>
    BandTrail,

    /// <summary>A root-locus branch; <see cref="CellTag.Index"/> says which.</summary>
    Branch,

    /// <summary>Tick labels and other text.</summary>
    Label,

    /// <summary>An open-loop zero.</summary>
    OpenLoopZero,

    /// <summary>An open-loop pole.</summary>
    OpenLoopPole,

    /// <summary>A closed-loop pole at the current parameter value that meets every spec.</summary>
    CurrentPole,

    /// <summary>A closed-loop pole at the current parameter value that violates a spec.</summary>
    CurrentPoleViolating,

    /// <summary>A cursor or picked point; drawn above everything else.</summary>
    Marker,
}
