using System.Collections.Immutable;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;
using TermLocus.Core.Time;

namespace TermLocus.App.Plot;

/// <summary>The spec limits to draw in the loop's own plane: lines and arcs in s, their images under z = e^{sT} in z.</summary>
public static class PlaneBoundaries
{
    /// <summary>The curves for <paramref name="specs"/>; <paramref name="reach"/> (s-plane only) is how far lines run, rad/s.</summary>
    public static ImmutableArray<BoundaryCurve> For(LoopPlane plane, Specs specs, double reach)
    {
        ArgumentNullException.ThrowIfNull(plane);
        if (!plane.IsSampled)
        {
            return SPlaneBoundaries.FromSpecs(specs, reach);
        }

        double t = plane.SampleTimeSeconds!.Value;
        var curves = ImmutableArray.CreateBuilder<BoundaryCurve>();
        curves.Add(ZPlaneBoundaries.UnitCircle());
        if (specs.MinDamping is double zeta && zeta > 0 && zeta < 1)
        {
            curves.Add(new BoundaryCurve(BoundaryKind.Damping, [.. ZPlane.DampingContour(zeta)]));
        }

        if (SpecCheck.RequiredDecayRate(specs) is double sigma && sigma > 0)
        {
            curves.Add(new BoundaryCurve(BoundaryKind.DecayRate, [.. ZPlane.DecayRateContour(sigma, t)]));
        }

        foreach (var wn in new[] { specs.MinNaturalFrequency, specs.MaxNaturalFrequency })
        {
            if (wn is double w && w > 0 && w * t < Math.PI)
            {
                curves.Add(new BoundaryCurve(BoundaryKind.NaturalFrequency, [.. ZPlane.NaturalFrequencyContour(w, t)]));
            }
        }

        return curves.ToImmutable();
    }
}
