using System.Collections.Immutable;
using System.Numerics;
using TermLocus.App.Canvas;
using TermLocus.App.Plot;

namespace TermLocus.App.Workbench;

/// <summary>
/// The s-plane of the open plant: the traced branches, open-loop poles and zeros, spec limits and the closed-loop
/// poles at the swept value, through the user's zoom and pan of the fitted view.
/// </summary>
public static class PlanePresenter
{
    /// <summary>How close (in cells) a click must be to a branch point to pick its value.</summary>
    public const double PickRadiusCells = 2.0;

    /// <summary>The drawn plane for a <paramref name="columns"/> × <paramref name="rows"/> area (both &gt;= 1).</summary>
    public static RenderedPlane Render(WorkbenchState state, int columns, int rows, CanvasSymbols symbols)
    {
        var (scene, view) = SceneAndView(state, columns, rows);
        return PlaneRenderer.Render(scene, view, columns, rows, symbols);
    }

    /// <summary>What is drawn and through which view.</summary>
    public static (PlaneScene Scene, PlaneView View) SceneAndView(WorkbenchState state, int columns, int rows)
    {
        if (state.Session is not { } session)
        {
            return (PlaneScene.Empty, PlaneView.Fit([], columns, rows));
        }

        var specs = session.Loaded.Plant.Specs;
        var plane = session.Loaded.Plane;
        var loop = session.Loop;
        var branches = Branches(session.Locus);
        // Fit to what does not move while stepping either value (the nominal locus), so the view holds still under
        // the arrow keys; trails and the poles at the current value are left out of the fit.
        var fitBranches = session.Cache.Find(session.Loaded.NominalKey) is { } nominal ? Branches(nominal) : branches;
        var still = new PlaneScene
        {
            Branches = fitBranches,
            OpenLoopPoles = session.Loaded.OpenLoopPoles,
            OpenLoopZeros = session.Loaded.OpenLoopZeros,
            CurrentPoles = fitBranches.IsEmpty ? CurrentPoles(session) : [],
            Boundaries = plane.IsSampled ? PlaneBoundaries.For(plane, specs, 1.0) : SPlaneBoundaries.FromSpecs(specs, 1.0),
        };
        var view = Adjust(PlaneView.Fit(still.PointsToFit(), columns, rows), state.View, columns, rows);
        double reach = view.Bounds(columns, rows).Reach();
        var scene = still with
        {
            Branches = branches,
            BandTrails = session.Band?.Trails.Select(t => t.Select(p => p.Pole).ToImmutableArray()).ToImmutableArray() ?? [],
            OpenLoopPoles = loop.OpenLoopPoles,
            OpenLoopZeros = loop.OpenLoopZeros,
            CurrentPoles = CurrentPoles(session),
            Boundaries = PlaneBoundaries.For(plane, specs, Math.Max(reach, double.Epsilon)),
            Markers = SelectedMarker(state, session),
        };
        return (scene, view);
    }

    /// <summary>
    /// The swept value of the traced point nearest to cell (<paramref name="column"/>, <paramref name="row"/>), when
    /// one lies within <see cref="PickRadiusCells"/>; else null.
    /// </summary>
    public static double? PickValue(WorkbenchState state, int column, int row, int columns, int rows)
    {
        if (state.Session?.Locus is not { } locus)
        {
            return null;
        }

        var (_, view) = SceneAndView(state, columns, rows);
        var bounds = view.Bounds(columns, rows);
        double re = bounds.MinReal + ((column + 0.5) * view.UnitsPerColumn);
        double im = bounds.MaxImaginary - ((row + 0.5) * view.UnitsPerRow);
        double best = double.PositiveInfinity;
        double? value = null;
        foreach (var point in locus.Branches.SelectMany(b => b))
        {
            double dx = (point.Pole.Real - re) / view.UnitsPerColumn;
            double dy = (point.Pole.Imaginary - im) / view.UnitsPerRow;
            double d = (dx * dx) + (dy * dy);
            if (d < best)
            {
                best = d;
                value = point.Value;
            }
        }

        return best <= PickRadiusCells * PickRadiusCells ? value : null;
    }

    private static PlaneView Adjust(PlaneView fitted, ViewState user, int columns, int rows)
    {
        var bounds = fitted.Bounds(columns, rows);
        var centre = fitted.Centre + new Complex(user.PanRight * bounds.RealSpan, user.PanUp * bounds.ImaginarySpan);
        return (fitted with { Centre = centre }).Zoom(user.ZoomFactor);
    }

    private static ImmutableArray<PlaneBranch> Branches(LocusAnalysis? locus) =>
        locus is null
            ? []
            : locus.Branches.Select((b, i) => new PlaneBranch(i, b.Select(p => p.Pole).ToImmutableArray())).ToImmutableArray();

    private static ImmutableArray<CurrentPole> CurrentPoles(PlantSession session) =>
        session.Poles.Poles
            .Select(p => new CurrentPole(p, !session.Poles.Plane.IsStable(p) || !session.Poles.MissesOf(p).IsEmpty))
            .ToImmutableArray();

    private static ImmutableArray<Complex> SelectedMarker(WorkbenchState state, PlantSession session)
    {
        if (state.Focus != Pane.Poles || state.Overlay is not NoOverlay)
        {
            return [];
        }

        var rows = PoleRows.Group(session.Poles.Poles, session.Poles.Plane);
        return session.SelectedPole < rows.Length ? [rows[session.SelectedPole].Pole] : [];
    }
}
