using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Plants;
using static TermLocus.Core.Tests.Plants.LoopModelTestPlants;

namespace TermLocus.Core.Tests.Plants;

public class LoopModelTests
{
    private const double Tol = 1e-12;

    [Fact]
    public void Unity_feedback_around_a_type_one_third_order_plant()
    {
        // Ogata, Modern Control Engineering, 5th ed., Sec. 6-2, Example 6-1 (from memory):
        // G(s) = K/(s(s+1)(s+2)), H = 1: characteristic s^3 + 3s^2 + 2s + K.
        var model = Model([("K", 2.5)], plant: "K/(s*(s+1)*(s+2))");
        AssertCoefficients([2.5, 2.0, 3.0, 1.0], model.Characteristic(Values()), Tol);
        Assert.False(model.HasGivenCharacteristic);
    }

    [Fact]
    public void The_same_loop_crosses_the_imaginary_axis_at_root_two_for_gain_six()
    {
        // Ogata, 5th ed., Example 6-1 (from memory): crossing at s = ±j√2 when K = 6 (Routh–Hurwitz).
        var model = Model([("K", 1.0)], plant: "K/(s*(s+1)*(s+2))");
        var roots = PolynomialRoots.Find(model.Characteristic(Values(("K", 6.0))));
        Assert.Contains(roots, r => Complex.Abs(r - new Complex(0, Math.Sqrt(2))) < 1e-9);
        Assert.Contains(roots, r => Complex.Abs(r - new Complex(0, -Math.Sqrt(2))) < 1e-9);
        Assert.Contains(roots, r => Complex.Abs(r - new Complex(-3, 0)) < 1e-9);
    }

    [Fact]
    public void Reference_to_output_has_the_characteristic_as_denominator()
    {
        // Unity feedback: T = G/(1+G) = K/(s^3 + 3s^2 + 2s + K) (common practice).
        var model = Model([("K", 4.0)], plant: "K/(s*(s+1)*(s+2))");
        var t = model.ReferenceToOutput(Values())!;
        AssertCoefficients([4.0], t.Numerator, Tol);
        Assert.Equal(model.Characteristic(Values()), t.Denominator);
        var gain = model.LoopGain(Values())!;
        AssertCoefficients([4.0], gain.Numerator, Tol);
        AssertCoefficients([0.0, 2.0, 3.0, 1.0], gain.Denominator, Tol);
    }

    [Fact]
    public void Positive_feedback_subtracts_the_loop_gain()
    {
        // Ogata, 5th ed., Sec. 6-4, root loci for positive-feedback systems (from memory):
        // G(s)H(s) = K(s+2)/((s+3)(s^2+2s+2)); 1 - GH gives s^3 + 5s^2 + (8-K)s + (6-2K); stable for K < 3.
        var model = Model([("K", 1.0)], plant: "K*(s+2)/((s+3)*(s^2+2*s+2))", feedback: FeedbackSign.Positive);
        AssertCoefficients([4.0, 7.0, 5.0, 1.0], model.Characteristic(Values()), Tol);

        var roots = PolynomialRoots.Find(model.Characteristic(Values(("K", 3.0))));
        Assert.Contains(roots, r => Complex.Abs(r) < 1e-9);
        Assert.All(roots.Where(r => Complex.Abs(r) >= 1e-9), r => Assert.True(r.Real < 0));
    }

    [Fact]
    public void A_sensor_in_the_feedback_path_adds_its_poles_to_the_loop_and_its_zeros_to_the_reference_path()
    {
        // Common practice: 1 + G·H with G = K/(s(s+2)), H = 1/(s+5) gives s(s+2)(s+5) + K = s^3 + 7s^2 + 10s + K,
        // and T = G/(1+GH) = K(s+5)/(s^3 + 7s^2 + 10s + K).
        var model = Model([("K", 12.0)], plant: "K/(s*(s+2))", sensor: "1/(s+5)");
        AssertCoefficients([12.0, 10.0, 7.0, 1.0], model.Characteristic(Values()), Tol);
        var t = model.ReferenceToOutput(Values())!;
        AssertCoefficients([60.0, 12.0], t.Numerator, Tol);
        Assert.Equal(model.Characteristic(Values()), t.Denominator);
    }

    [Fact]
    public void A_controller_multiplies_the_plant()
    {
        // Invented example of the plant-file design (spindle speed loop): C = Kc(s+20)/s,
        // G = Kt/((J s + B)(tau s + 1)): P = s(J s + B)(tau s + 1) + Kc·Kt·(s + 20).
        (string, double)[] p = [("Kc", 0.8), ("Kt", 0.9), ("J", 0.035), ("B", 0.012), ("tau", 0.004)];
        var model = Model(p, plant: "Kt / ((J*s + B) * (tau*s + 1))", controller: "Kc * (s + 20) / s");
        double kc = 0.8, kt = 0.9, j = 0.035, b = 0.012, tau = 0.004;
        double[] expected = [kc * kt * 20, b + (kc * kt), j + (b * tau), j * tau];
        AssertCoefficients(expected, model.Characteristic(Values()), 1e-13);
    }

    [Fact]
    public void A_given_characteristic_is_used_as_written()
    {
        // Plant-file design: characteristic = "J*s^2 + (B + Kc)*s + Kt".
        var model = Model([("Kc", 2.0), ("J", 0.5), ("B", 0.1), ("Kt", 3.0)], plant: null, characteristic: "J*s^2 + (B + Kc)*s + Kt");
        Assert.True(model.HasGivenCharacteristic);
        AssertCoefficients([3.0, 2.1, 0.5], model.Characteristic(Values()), Tol);
        Assert.Null(model.LoopGain(Values()));
        Assert.Null(model.ReferenceToOutput(Values()));
        Assert.Empty(model.HiddenPoles(Values()));
    }

    [Fact]
    public void A_given_characteristic_divided_by_a_constant_keeps_its_numerator()
    {
        var model = Model([("J", 4.0)], plant: null, characteristic: "(s^2 + 2*s + 1)/J");
        AssertCoefficients([1.0, 2.0, 1.0], model.Characteristic(Values()), Tol);
    }

    [Fact]
    public void Values_left_out_take_the_nominal_value_and_given_ones_override_it()
    {
        var model = Model([("K", 2.0), ("a", 1.0)], plant: "K/(s+a)");
        AssertCoefficients([3.0, 1.0], model.Characteristic(Values()), Tol);
        AssertCoefficients([6.0, 1.0], model.Characteristic(Values(("K", 5.0))), Tol);
        AssertCoefficients([9.0, 1.0], model.Characteristic(Values(("K", 5.0), ("a", 4.0))), Tol);
    }

    [Fact]
    public void Cancelled_factors_stay_in_the_characteristic()
    {
        // Plant-file design, Meaning: (s+1) cancels in G but is still a closed-loop pole:
        // (s+1)(s+2) + K(s+1) = (s+1)(s+2+K).
        var model = Model([("K", 3.0)], plant: "K*(s+1)/((s+1)*(s+2))");
        AssertCoefficients([5.0, 6.0, 1.0], model.Characteristic(Values()), Tol);
    }
}
