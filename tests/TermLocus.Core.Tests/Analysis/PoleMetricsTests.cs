using System.Numerics;
using CsCheck;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Analysis;

public class PoleMetricsTests
{
    [Fact]
    public void A_pole_at_minus_3_plus_4j_has_the_textbook_second_order_figures()
    {
        // s = -ζωn + jωn√(1-ζ²): with ωn = 5, ζ = 0.6 the pole is -3 + 4j (Nise, Control Systems Engineering, 6th ed.,
        // §4.6 second-order relations, from memory): ζ = cos θ with θ the angle from the negative real axis,
        // ωd = ωn√(1-ζ²) = 4, σ = ζωn = 3, Ts(2 %) ≈ 4/(ζωn) = 4/3 s, time to half amplitude ln2/σ.
        var m = PoleMetrics.Of(new Complex(-3, 4));
        Assert.Equal(5.0, m.NaturalFrequency, 1e-15);
        Assert.Equal(0.6, m.Damping!.Value, 1e-15);
        Assert.Equal(Math.Cos(Math.Atan2(4, 3)), m.Damping.Value, 1e-15);
        Assert.Equal(4.0, m.DampedFrequency, 1e-15);
        Assert.Equal(3.0, m.DecayRate, 1e-15);
        Assert.Equal(Math.Log(2) / 3.0, m.TimeToHalfSeconds!.Value, 1e-15);
        Assert.Equal(4.0 / 3.0, m.SettlingTime2PctSeconds!.Value, 1e-15);
        Assert.Null(m.TimeToDoubleSeconds);
    }

    [Fact]
    public void Second_order_relations_hold_for_any_underdamped_pair()
    {
        // Handbook relations (Ogata, Modern Control Engineering, 5th ed., transient-response chapter, from memory):
        // ωd = ωn√(1-ζ²), σ = ζωn, Ts(2 %) = 4/(ζωn), time to half = ln2/(ζωn).
        Gen.Select(Gen.Double[0.01, 0.99], Gen.Double[0.1, 100.0]).Sample((zeta, wn) =>
        {
            var pole = new Complex(-zeta * wn, wn * Math.Sqrt(1 - (zeta * zeta)));
            var m = PoleMetrics.Of(pole);
            Assert.Equal(zeta, m.Damping!.Value, 1e-13);
            Assert.Equal(wn, m.NaturalFrequency, 1e-13 * wn);
            Assert.Equal(wn * Math.Sqrt(1 - (zeta * zeta)), m.DampedFrequency, 1e-13 * wn);
            Assert.Equal(zeta * wn, m.DecayRate, 1e-13 * wn);
            Assert.Equal(4.0 / (zeta * wn), m.SettlingTime2PctSeconds!.Value, 1e-12 * m.SettlingTime2PctSeconds.Value);
            Assert.Equal(Math.Log(2) / (zeta * wn), m.TimeToHalfSeconds!.Value, 1e-12 * m.TimeToHalfSeconds.Value);
        }, iter: 200);
    }

    [Fact]
    public void Real_poles_have_damping_plus_or_minus_one()
    {
        // A stable first-order pole -a decays as e^(-at): ζ = 1, half amplitude after ln2/a; an unstable pole +a
        // doubles after ln2/a (common practice).
        var stable = PoleMetrics.Of(new Complex(-2, 0));
        Assert.Equal(1.0, stable.Damping!.Value, 1e-15);
        Assert.Equal(0.0, stable.DampedFrequency, 1e-15);
        Assert.Equal(Math.Log(2) / 2, stable.TimeToHalfSeconds!.Value, 1e-15);

        var unstable = PoleMetrics.Of(new Complex(2, 0));
        Assert.Equal(-1.0, unstable.Damping!.Value, 1e-15);
        Assert.Equal(-2.0, unstable.DecayRate, 1e-15);
        Assert.Null(unstable.TimeToHalfSeconds);
        Assert.Null(unstable.SettlingTime2PctSeconds);
        Assert.Equal(Math.Log(2) / 2, unstable.TimeToDoubleSeconds!.Value, 1e-15);
    }

    [Fact]
    public void Imaginary_axis_origin_and_right_half_plane_poles()
    {
        // An undamped oscillation at 3 rad/s: ζ = 0, neither halves nor doubles (common practice).
        var undamped = PoleMetrics.Of(new Complex(0, 3));
        Assert.Equal(0.0, undamped.Damping!.Value, 1e-15);
        Assert.Equal(3.0, undamped.NaturalFrequency, 1e-15);
        Assert.Null(undamped.TimeToHalfSeconds);
        Assert.Null(undamped.TimeToDoubleSeconds);

        // ζ is undefined at the origin (the design contract reports null there).
        var origin = PoleMetrics.Of(Complex.Zero);
        Assert.Null(origin.Damping);
        Assert.Equal(0.0, origin.NaturalFrequency);

        // 1 + j lies at 135° from the negative real axis: ζ = cos 135° = -1/√2.
        Assert.Equal(-1 / Math.Sqrt(2), PoleMetrics.Of(new Complex(1, 1)).Damping!.Value, 1e-15);
    }
}
