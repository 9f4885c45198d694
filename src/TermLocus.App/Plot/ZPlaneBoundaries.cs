using System.Numerics;

namespace TermLocus.App.Plot;

/// <summary>Fixed z-plane curves. The ζ and ωn contours of a sampled loop come from the z = e^{sT} mapping in Core
/// and are passed in as ready polylines.</summary>
public static class ZPlaneBoundaries
{
    /// <summary>The unit circle |z| = 1, closed.</summary>
    public static BoundaryCurve UnitCircle() => new(BoundaryKind.UnitCircle, PlaneCurves.Circle(Complex.Zero, 1));
}
