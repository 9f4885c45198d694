using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using static TermLocus.Core.Tests.Plants.LoopModelTestPlants;

namespace TermLocus.Core.Tests.Plants;

public class LoopModelPlaneTests
{
    private const double Tol = 1e-12;

    [Fact]
    public void A_continuous_loop_reads_its_roots_as_they_are()
    {
        var plane = Model([("K", 1.0)], "K/(s+1)").Plane;
        Assert.Same(LoopPlane.Continuous, plane);
        Assert.Equal("s", plane.VariableName);
        Assert.Null(plane.SampleTimeSeconds);
        Assert.Null(plane.NyquistFrequency);
        var s = new Complex(-2, 3);
        Assert.Equal(s, plane.ToEquivalentS(s));
        Assert.Equal(PoleMetrics.Of(s), plane.MetricsOf(s));
        Assert.True(plane.IsStable(s));
        Assert.False(plane.IsStable(new Complex(0, 1)));
        Assert.False(plane.IsStable(new Complex(1e-12, 0)));
    }

    [Fact]
    public void The_textbook_pole_pair_of_the_sampled_motor_loop_has_the_figures_of_its_s_plane_equivalent()
    {
        // K = 1: z² − z + 0.6321 = 0 gives z = 0.5 ± j0.6182 (Ogata, Discrete-Time Control Systems, 2nd ed., ch. 4,
        // from memory). z = e^{sT} (definition): σ = −ln|z|/T = −ln(0.7951) = 0.2293 1/s, ωd = arg(z)/T = atan(0.6182/0.5) = 0.8907 rad/s,
        // ζ = σ/√(σ² + ωd²) = 0.2494 (worked by hand from the rounded pole).
        var model = Sampled([("K", 1.0)], "K/(s*(s+1))", 1.0);
        var upper = PolynomialRoots.Find(model.Characteristic(Values())).Single(z => z.Imaginary > 0);
        Assert.Equal(0.5, upper.Real, 1e-12);
        Assert.Equal(0.6182, upper.Imaginary, 1e-4);
        var metrics = model.Plane.MetricsOf(upper)!;
        Assert.Equal(0.2293, metrics.DecayRate, 1e-4);
        Assert.Equal(0.8907, metrics.DampedFrequency, 1e-4);
        Assert.Equal(0.2494, metrics.Damping!.Value, 1e-4);
        Assert.True(model.Plane.IsStable(upper));
    }

    [Theory]
    [InlineData(-0.4, 1.1, 0.5)]
    [InlineData(-30.0, 0.0, 0.01)]
    [InlineData(0.2, -2.0, 1.0)]
    public void An_s_plane_pole_sampled_and_read_back_keeps_its_figures(double re, double im, double t)
    {
        // z = e^{sT} and s = ln(z)/T are inverse inside the band |Im s| < π/T (definition of the principal logarithm).
        var plane = LoopPlane.Sampled(t);
        var s = new Complex(re, im);
        var z = plane.FromEquivalentS(s);
        var back = plane.ToEquivalentS(z);
        Assert.Equal(re, back.Real, 1e-9);
        Assert.Equal(im, back.Imaginary, 1e-9);
        var expected = PoleMetrics.Of(s);
        var actual = plane.MetricsOf(z)!;
        Assert.Equal(expected.Damping!.Value, actual.Damping!.Value, 1e-9);
        Assert.Equal(expected.NaturalFrequency, actual.NaturalFrequency, 1e-9);
        Assert.Equal(re < 0, plane.IsStable(z));
    }

    [Fact]
    public void A_mode_above_half_the_sampling_frequency_is_read_at_its_alias()
    {
        // e^{sT} repeats every 2π/T in Im s (aliasing, common practice): ω = π/T + 0.5 reads as −(π/T − 0.5).
        const double t = 0.1;
        var plane = LoopPlane.Sampled(t);
        var z = plane.FromEquivalentS(new Complex(-0.3, (Math.PI / t) + 0.5));
        var back = plane.ToEquivalentS(z);
        Assert.Equal(-0.3, back.Real, 1e-9);
        Assert.Equal(-((Math.PI / t) - 0.5), back.Imaginary, 1e-9);
        Assert.Equal(Math.PI / t, plane.NyquistFrequency!.Value, Tol);
    }

    [Fact]
    public void A_deadbeat_pole_is_stable_and_has_no_finite_figures()
    {
        var plane = LoopPlane.Sampled(0.01);
        Assert.True(plane.IsStable(Complex.Zero));
        Assert.Null(plane.MetricsOf(Complex.Zero));
        Assert.False(plane.IsStable(new Complex(0, 1)));
        Assert.False(plane.IsStable(new Complex(-1.0000001, 0)));
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-1.0)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(double.NaN)]
    public void A_bad_sample_time_is_refused(double t) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => LoopPlane.Sampled(t));
}
