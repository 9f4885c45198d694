using System.Numerics;
using TermLocus.Core.Time;

namespace TermLocus.Core.Tests.Time;

public class ZPlaneTests
{
    private const double T = 0.01;

    [Fact]
    public void Logarithm_inverts_the_exponential_inside_the_nyquist_band()
    {
        // z = e^{sT} ⇔ s = ln(z)/T for |Im s| < π/T (Ogata, Discrete-Time Control Systems, 2nd ed., ch. 4, from memory).
        foreach (var s in new[] { new Complex(-3, 40), new Complex(-100, -250), new Complex(5, 300) })
        {
            var back = ZPlane.ToS(ZPlane.FromS(s, T), T);
            Assert.Equal(s.Real, back.Real, 1e-10);
            Assert.Equal(s.Imaginary, back.Imaginary, 1e-10);
        }
    }

    [Fact]
    public void Negative_real_pole_maps_to_the_upper_nyquist_frequency()
    {
        foreach (var z in new[] { new Complex(-0.5, 0.0), new Complex(-0.5, -0.0) })
        {
            var s = ZPlane.ToS(z, T);
            Assert.Equal(Math.Log(0.5) / T, s.Real, 1e-10);
            Assert.Equal(Math.PI / T, s.Imaginary, 1e-10);
        }
    }

    [Fact]
    public void Metrics_of_a_z_pole_are_those_of_its_s_equivalent()
    {
        // s = −1 + 2j: ζ = 1/√5, ωn = √5 (common practice).
        var metrics = ZPlane.MetricsOf(ZPlane.FromS(new Complex(-1, 2), T), T)!;
        Assert.Equal(1 / Math.Sqrt(5), metrics.Damping!.Value, 1e-9);
        Assert.Equal(Math.Sqrt(5), metrics.NaturalFrequency, 1e-9);
        Assert.Null(ZPlane.MetricsOf(Complex.Zero, T));
        Assert.True(ZPlane.IsStable(new Complex(0.6, 0.79)));
        Assert.False(ZPlane.IsStable(new Complex(0.6, 0.81)));
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(0.3)]
    [InlineData(0.7)]
    public void Damping_contour_points_carry_the_given_damping(double zeta)
    {
        var contour = ZPlane.DampingContour(zeta, 46);
        Assert.Equal(91, contour.Length);
        Assert.Equal(Complex.One, contour[0]);
        Assert.Equal(contour[0], contour[^1]);
        for (int k = 1; k < contour.Length - 1; k++)
        {
            Assert.Equal(zeta, ZPlane.MetricsOf(contour[k], T)!.Damping!.Value, 1e-9);
        }
    }

    [Fact]
    public void Full_damping_contour_is_the_segment_from_one_to_zero()
    {
        var contour = ZPlane.DampingContour(1.0, 11);
        Assert.Equal(1.0, contour[0].Real, 0.0);
        Assert.Equal(0.0, contour[^1].Real, 0.0);
        Assert.All(contour, z => Assert.Equal(0.0, z.Imaginary, 0.0));
    }

    [Fact]
    public void Natural_frequency_and_decay_contours_carry_their_values()
    {
        const double wn = 200.0; // ωn·T = 2 < π
        var contour = ZPlane.NaturalFrequencyContour(wn, T, 31);
        Assert.Equal(61, contour.Length);
        Assert.All(contour, z => Assert.Equal(wn, Complex.Abs(ZPlane.ToS(z, T)), 1e-9));
        Assert.All(ZPlane.DecayRateContour(50.0, T), z => Assert.Equal(Math.Exp(-0.5), Complex.Abs(z), 1e-15));
        var circle = ZPlane.UnitCircle(9);
        Assert.Equal(circle[0], circle[^1]);
        Assert.All(circle, z => Assert.Equal(1.0, Complex.Abs(z), 1e-15));
        Assert.Throws<ArgumentOutOfRangeException>(() => ZPlane.DampingContour(1.5));
        Assert.Throws<ArgumentOutOfRangeException>(() => ZPlane.ToS(Complex.One, 0.0));
    }
}
