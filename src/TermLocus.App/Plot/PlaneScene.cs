using System.Collections.Immutable;
using System.Numerics;

namespace TermLocus.App.Plot;

/// <summary>
/// Everything one s-plane or z-plane plot shows, in plane coordinates. Build with an object initialiser; every
/// list defaults to empty. Drawing order, lowest first: spec boundaries, band trails, branches, open-loop zeros and
/// poles, current poles, markers; where they share a cell the later layer wins (see <c>CellLayer</c>).
/// </summary>
public sealed record PlaneScene
{
    /// <summary>A scene with nothing in it.</summary>
    public static PlaneScene Empty { get; } = new();

    /// <summary>Root-locus branches.</summary>
    public ImmutableArray<PlaneBranch> Branches { get; init; } = [];

    /// <summary>Paths poles take across the tolerance band, drawn dimmer than branches.</summary>
    public ImmutableArray<ImmutableArray<Complex>> BandTrails { get; init; } = [];

    /// <summary>Open-loop poles, drawn as crosses.</summary>
    public ImmutableArray<Complex> OpenLoopPoles { get; init; } = [];

    /// <summary>Open-loop zeros, drawn as rings.</summary>
    public ImmutableArray<Complex> OpenLoopZeros { get; init; } = [];

    /// <summary>Closed-loop poles at the current parameter value.</summary>
    public ImmutableArray<CurrentPole> CurrentPoles { get; init; } = [];

    /// <summary>Spec limits.</summary>
    public ImmutableArray<BoundaryCurve> Boundaries { get; init; } = [];

    /// <summary>Cursor or picked points.</summary>
    public ImmutableArray<Complex> Markers { get; init; } = [];

    /// <summary>
    /// The points an automatic view should include: every branch, trail, pole, zero and marker, the closed curves
    /// (ωn arcs, unit circle) and where a decay-rate line crosses the real axis. ζ lines are left out: they are rays
    /// and would stretch the view for nothing.
    /// </summary>
    public IEnumerable<Complex> PointsToFit()
    {
        IEnumerable<Complex> points = Branches.SelectMany(b => b.Points)
            .Concat(BandTrails.SelectMany(t => t))
            .Concat(OpenLoopPoles)
            .Concat(OpenLoopZeros)
            .Concat(CurrentPoles.Select(p => p.Position))
            .Concat(Markers);
        foreach (BoundaryCurve boundary in Boundaries)
        {
            if (boundary.Kind is BoundaryKind.NaturalFrequency or BoundaryKind.UnitCircle)
            {
                points = points.Concat(boundary.Points);
            }
            else if (boundary.Kind == BoundaryKind.DecayRate && !boundary.Points.IsEmpty)
            {
                points = points.Append(new Complex(boundary.Points[0].Real, 0));
            }
        }

        return points;
    }
}
