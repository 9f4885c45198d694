using System.Numerics;
using TermLocus.App.Plot;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Plot;

public class SPlaneBoundariesTests
{
    private const double Tol = 1e-9;

    // A line of constant damping makes the angle acos(ζ) with the negative real axis; ζ = 0.5 gives 60°
    // (Ogata, Modern Control Engineering, 5th ed., section 5-3, s-plane figures; from memory).
    [Fact]
    public void Damping_lines_leave_the_origin_at_acos_zeta_from_the_negative_real_axis()
    {
        BoundaryCurve boundary = SPlaneBoundaries.Damping(0.5, 10);

        Complex upper = boundary.Points[0];
        Complex lower = boundary.Points[2];
        Assert.Equal(Complex.Zero, boundary.Points[1]);
        Assert.Equal(60.0, Math.Atan2(upper.Imaginary, -upper.Real) * 180 / Math.PI, Tol);
        Assert.Equal(-60.0, Math.Atan2(lower.Imaginary, -lower.Real) * 180 / Math.PI, Tol);
        Assert.Equal(10.0, upper.Magnitude, Tol);
        Assert.Equal(0.5, PoleMetrics.Of(upper).Damping!.Value, Tol);
    }

    [Fact]
    public void The_decay_rate_line_is_vertical_at_minus_sigma()
    {
        BoundaryCurve boundary = SPlaneBoundaries.DecayRate(0.8, 5);

        Assert.All(boundary.Points, p => Assert.Equal(-0.8, p.Real, Tol));
        Assert.Equal(-5.0, boundary.Points[0].Imaginary, Tol);
        Assert.Equal(5.0, boundary.Points[^1].Imaginary, Tol);
    }

    [Fact]
    public void The_natural_frequency_arc_is_the_left_half_circle()
    {
        BoundaryCurve boundary = SPlaneBoundaries.NaturalFrequency(3);

        Assert.All(boundary.Points, p => Assert.Equal(3.0, p.Magnitude, Tol));
        Assert.All(boundary.Points, p => Assert.True(p.Real <= Tol));
        Assert.Equal(3.0, boundary.Points[0].Imaginary, Tol);
        Assert.Equal(-3.0, boundary.Points[^1].Imaginary, Tol);
        Assert.Contains(boundary.Points, p => Math.Abs(p.Real + 3) < Tol);
    }

    // Time to half amplitude ln2/σ and the 2 % settling time estimate 4/σ (Ogata, Modern Control Engineering, 5th ed.,
    // section 5-3, settling time with the 2 % criterion; from memory): t_half = 0.5 s needs σ >= 1.386, t_s = 2 s needs σ >= 2, so the settling limit is the strict one.
    [Fact]
    public void The_strictest_decay_rate_wins()
    {
        var specs = new Specs(MinDecayRate: 0.5, MaxTimeToHalfSeconds: 0.5, MaxSettlingTimeSeconds: 2);

        Assert.Equal(2.0, SPlaneBoundaries.StrictestDecayRate(specs)!.Value, Tol);
        Assert.Equal(Math.Log(2) / 0.5, SPlaneBoundaries.StrictestDecayRate(new Specs(MaxTimeToHalfSeconds: 0.5))!.Value, Tol);
        Assert.Null(SPlaneBoundaries.StrictestDecayRate(Specs.None));
    }

    [Fact]
    public void Specs_become_one_boundary_per_shape()
    {
        var specs = new Specs(MinDamping: 0.7, MinDecayRate: 1, MinNaturalFrequency: 2, MaxNaturalFrequency: 8);

        var kinds = SPlaneBoundaries.FromSpecs(specs, 20).Select(b => b.Kind).ToArray();

        Assert.Equal(
            [BoundaryKind.Damping, BoundaryKind.DecayRate, BoundaryKind.NaturalFrequency, BoundaryKind.NaturalFrequency],
            kinds);
        Assert.Empty(SPlaneBoundaries.FromSpecs(Specs.None, 20));
    }

    [Fact]
    public void The_unit_circle_is_closed_and_round()
    {
        BoundaryCurve circle = ZPlaneBoundaries.UnitCircle();

        Assert.All(circle.Points, p => Assert.Equal(1.0, p.Magnitude, Tol));
        Assert.Equal(circle.Points[0].Real, circle.Points[^1].Real, Tol);
        Assert.Equal(circle.Points[0].Imaginary, circle.Points[^1].Imaginary, Tol);
    }
}
