using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.App.Plot;

/// <summary>Builds the picture of a locus study: branches, open-loop marks, spec limits and the poles at the current value.</summary>
public static class LocusScene
{
    /// <summary>
    /// The scene and a fitted view for a <paramref name="columns"/> × <paramref name="rows"/> area. The view fits
    /// the locus and the open-loop marks (not the moving poles), so it holds still while the value is stepped.
    /// </summary>
    /// <param name="study">The traced locus and its facts.</param>
    /// <param name="specs">The plant's specs (drawn as limits).</param>
    /// <param name="currentPoles">Closed-loop roots at the current value, in the loop's own plane.</param>
    /// <param name="violating">Whether each current root misses a spec (same order), or empty for none.</param>
    /// <param name="columns">Plot width in cells (&gt;= 1).</param>
    /// <param name="rows">Plot height in cells (&gt;= 1).</param>
    public static (PlaneScene Scene, PlaneView View) Build(
        LocusStudy study, Specs specs, IReadOnlyList<Complex> currentPoles, IReadOnlyList<bool> violating, int columns, int rows)
    {
        ArgumentNullException.ThrowIfNull(study);
        var branches = study.Trace.Branches
            .Select((b, i) => new PlaneBranch(i, b.Points.Select(p => p.Pole).ToImmutableArray()))
            .ToImmutableArray();
        var current = currentPoles
            .Select((p, i) => new CurrentPole(p, i < violating.Count && violating[i]))
            .ToImmutableArray();
        var still = new PlaneScene
        {
            Branches = branches,
            OpenLoopPoles = study.Facts.OpenLoopPoles,
            OpenLoopZeros = study.Facts.OpenLoopZeros,
            CurrentPoles = branches.IsEmpty ? current : [],
            Boundaries = study.Plane.IsSampled ? PlaneBoundaries.For(study.Plane, specs, 1.0) : [],
        };
        var view = PlaneView.Fit(still.PointsToFit(), columns, rows);
        double reach = Math.Max(view.Bounds(columns, rows).Reach(), double.Epsilon);
        return (still with { CurrentPoles = current, Boundaries = PlaneBoundaries.For(study.Plane, specs, reach) }, view);
    }
}
