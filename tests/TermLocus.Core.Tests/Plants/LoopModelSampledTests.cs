using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;
using static TermLocus.Core.Tests.Plants.LoopModelTestPlants;

namespace TermLocus.Core.Tests.Plants;

public class LoopModelSampledTests
{
    private const double Tol = 1e-12;
    private static readonly double E1 = Math.Exp(-1.0);

    [Fact]
    public void Motor_loop_sampled_every_second_gives_the_textbook_characteristic()
    {
        // K/(s(s + 1)) behind a zero-order hold, T = 1 s, unity feedback: z² + (0.3679K − 1.3679)z + (0.3679 + 0.2642K)
        // (K. Ogata, Discrete-Time Control Systems, 2nd ed., ch. 4, from memory). Exactly: 0.3679 = e^{−1},
        // 1.3679 = 1 + e^{−1}, 0.2642 = 1 − 2e^{−1} (the hold equivalent (T − 1 + e^{−T})z + (1 − e^{−T} − Te^{−T})
        // over (z − 1)(z − e^{−T}), Ogata ch. 3 table, from memory).
        const double k = 1.7;
        var model = Sampled([("K", k)], "K/(s*(s+1))", 1.0);
        var p = model.Characteristic(Values());
        AssertCoefficients([E1 + ((1 - (2 * E1)) * k), (E1 * k) - 1 - E1, 1.0], p, Tol);
        AssertCoefficients([0.3679 + (0.2642 * k), (0.3679 * k) - 1.3679, 1.0], p, 1e-4 * k);
        Assert.Equal(PlaneKind.Z, model.Plane.Kind);
        Assert.Equal("z", model.Plane.VariableName);
        Assert.Equal(1.0, model.Plane.SampleTimeSeconds);
    }

    [Fact]
    public void Its_critical_gain_puts_a_pole_pair_on_the_unit_circle()
    {
        // The pair reaches |z| = 1 when the constant term is 1: K = (1 − e^{−1})/(1 − 2e^{−1}) = (e − 1)/(e − 2) = 2.3922
        // (Jury's test on the quadratic, worked by hand; Ogata, Discrete-Time Control Systems, 2nd ed., ch. 4, from memory).
        var model = Sampled([("K", 1.0)], "K/(s*(s+1))", 1.0);
        double critical = (Math.E - 1) / (Math.E - 2);
        Assert.Equal(2.3922, critical, 1e-4);
        Assert.Equal(critical, LoopModelDelayTests.CriticalGain(model, 0.5, 5.0), 1e-9);
        var onCircle = PolynomialRoots.Find(model.Characteristic(Values(("K", critical))));
        Assert.All(onCircle, z => Assert.Equal(1.0, Complex.Abs(z), 1e-9));
    }

    [Fact]
    public void A_gain_in_the_plant_passes_through_the_hold_and_the_family_is_affine()
    {
        // (K·G)_hold = K·G_hold (the hold equivalent is linear in G; definition), so P = A + K·B with
        // A = z² − 1.3679z + 0.3679 and B = 0.3679z + 0.2642 (Ogata, as above).
        var model = Sampled([("K", 1.0)], "K/(s*(s+1))", 1.0);
        var family = model.Family("K", Values());
        Assert.NotNull(family.Affine);
        AssertCoefficients([E1, -1 - E1, 1.0], family.Affine!.A, Tol);
        AssertCoefficients([1 - (2 * E1), E1], family.Affine.B, Tol);
    }

    [Fact]
    public void A_controller_gain_written_in_z_is_affine_and_a_plant_pole_is_not()
    {
        // Controller Kc·(z − 0.5)/(z − 0.9) in front of the held 1/(s(s + 1)): P = (z − 0.9)·D + Kc·(z − 0.5)·N, affine
        // in Kc (common practice). A swept plant pole a enters the hold through e^{−aT}: not a polynomial in a.
        var model = Sampled([("Kc", 0.4), ("a", 1.0)], "1/(s*(s+a))", 1.0, controller: "Kc*(z - 0.5)/(z - 0.9)");
        var byGain = model.Family("Kc", Values());
        Assert.NotNull(byGain.Affine);
        AssertCoefficients([E1 * -0.9, E1 + (0.9 * (1 + E1)), -1.9 - E1, 1.0], byGain.Affine!.A, Tol);
        AssertCoefficients([-0.5 * (1 - (2 * E1)), (1 - (2 * E1)) - (0.5 * E1), E1], byGain.Affine.B, Tol);

        var byPole = model.Family("a", Values());
        Assert.Null(byPole.Affine);
        foreach (double a in new[] { 0.5, 2.0 })
        {
            AssertCoefficients([.. model.Characteristic(Values(("a", a))).Coefficients], byPole.At(a), Tol);
        }
    }

    [Fact]
    public void An_s_free_controller_is_a_constant_gain()
    {
        var model = Sampled([("K", 1.0), ("Kc", 2.0)], "K/(s*(s+1))", 1.0, controller: "Kc");
        var reference = Sampled([("K", 2.0)], "K/(s*(s+1))", 1.0);
        AssertCoefficients([.. reference.Characteristic(Values()).Coefficients], model.Characteristic(Values()), Tol);
    }

    [Fact]
    public void A_whole_sample_delay_multiplies_the_loop_by_z_to_the_minus_one()
    {
        // e^{−sT} with T the sample time is exactly z^{−1} after the hold (z-transform shift theorem, common practice):
        // P = z·(z² − 1.3679z + 0.3679) + K·(0.3679z + 0.2642).
        const double k = 0.6;
        var model = Sampled([("K", k)], "K/(s*(s+1))", 1.0, delay: 1.0);
        AssertCoefficients([(1 - (2 * E1)) * k, E1 + (E1 * k), -1 - E1, 1.0], model.Characteristic(Values()), Tol);
        Assert.NotNull(model.Family("K", Values()).Affine);
    }

    [Fact]
    public void A_fractional_delay_uses_the_modified_z_transform()
    {
        // 1/(s + a) with delay τ = 0.3T: ((1 − e^{−a(T−τ)})z + e^{−a(T−τ)} − e^{−aT}) / (a·z·(z − e^{−aT}))
        // (Franklin, Powell & Workman, Digital Control of Dynamic Systems, 3rd ed., §4.3.4, from memory).
        const double a = 2.0, t = 0.5, tau = 0.15;
        var model = Sampled([("a", a)], "1/(s+a)", t, delay: tau);
        var gain = model.LoopGain(Values())!;
        double late = Math.Exp(-a * (t - tau)), full = Math.Exp(-a * t);
        AssertCoefficients([(late - full) / a, (1 - late) / a], gain.Numerator, Tol);
        AssertCoefficients([0.0, -full, 1.0], gain.Denominator, Tol);
    }

    [Fact]
    public void A_sensor_shapes_the_loop_and_leaves_the_output_path_with_the_plant_alone()
    {
        // G = 1/s, H = 1/(s + 1), T = 1: (G·H)_hold is the motor equivalent above, G_hold = 1/(z − 1), and the sampled
        // closed loop is C·G_hold/(1 + C·(GH)_hold) (Ogata, Discrete-Time Control Systems, 2nd ed., ch. 3, block
        // diagrams with samplers, from memory); checked here at a point off the real axis.
        var model = Sampled([("K", 0.8)], "K/s", 1.0, sensor: "1/(s+1)");
        var closed = model.ReferenceToOutput(Values())!;
        Assert.Equal(model.Characteristic(Values()), closed.Denominator);
        var z = new Complex(0.3, 0.7);
        var gHold = 0.8 / (z - 1);
        var ghHold = 0.8 * ((E1 * z) + 1 - (2 * E1)) / ((z - 1) * (z - E1));
        var expected = gHold / (1 + ghHold);
        Assert.True(Complex.Abs(closed.Evaluate(z) - expected) < 1e-12);
    }

    [Fact]
    public void Hidden_poles_are_found_in_z()
    {
        // A controller zero at z = 0.5 over a controller pole at 0.5 hides that pole (plant-file design: nothing cancelled).
        var model = Sampled([("K", 1.0)], "K/(s*(s+1))", 1.0, controller: "(z - 0.5)/(z - 0.5)");
        var hidden = model.HiddenPoles(Values());
        Assert.Single(hidden);
        Assert.Equal(0.5, hidden[0].Real, 1e-9);
        Assert.Equal(3, model.Characteristic(Values()).Degree);
    }

    [Fact]
    public void A_controller_written_in_s_is_a_located_error()
    {
        var plant = Loop([("Kc", 1.0)], "1/(s+1)", controller: "Kc*(s + 2)", sampleTime: 0.1);
        var e = Assert.Throws<PlantFileException>(() => LoopModel.Create(plant));
        Assert.Equal(5, e.Error.Position.Column);
        Assert.Contains("with sample_time set, write the controller in z", e.Error.Message, StringComparison.Ordinal);

        var given = Loop([("K", 1.0)], plant: null, characteristic: "s^2 + K", sampleTime: 0.1);
        var g = Assert.Throws<PlantFileException>(() => LoopModel.Create(given));
        Assert.Contains("write the characteristic in z", g.Error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_characteristic_given_in_z_is_taken_as_it_is()
    {
        var model = Sampled([("K", 0.2)], plant: null, 0.1, characteristic: "z^2 - 0.5*z + K");
        AssertCoefficients([0.2, -0.5, 1.0], model.Characteristic(Values()), Tol);
        Assert.Equal(PlaneKind.Z, model.Plane.Kind);
        Assert.Null(model.ReferenceToOutput(Values()));
    }

    [Fact]
    public void An_improper_plant_cannot_be_held()
    {
        var model = Sampled([("K", 1.0)], "K*(s^2 + 1)/(s + 1)", 0.1);
        var e = Assert.Throws<PlantFileException>(() => model.Characteristic(Values()));
        Assert.Contains("proper", e.Error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_very_short_sample_time_for_a_fifth_order_plant_warns()
    {
        // ZeroOrderHold.AccuracyEstimate: 1.1e-16·2⁵/Π|pT| = 3.5e-15/T⁵ for five poles at −1: 3.5e5 at T = 1e-4
        // (no accuracy left), 3.5e-15 at T = 1 s.
        var fast = Sampled([("K", 1.0)], "K/(s+1)^5", 1e-4);
        Assert.Contains("short", fast.SamplingWarning(Values()), StringComparison.Ordinal);
        var slow = Sampled([("K", 1.0)], "K/(s+1)^5", 1.0);
        Assert.Null(slow.SamplingWarning(Values()));
        Assert.Null(Model([("K", 1.0)], "K/(s+1)^5").SamplingWarning(Values()));
    }
}
