using TermLocus.Core.Plants;
using static TermLocus.Core.Tests.Plants.LoopModelTestPlants;

namespace TermLocus.Core.Tests.Plants;

public class LoopModelFamilyTests
{
    private const double Tol = 1e-12;

    [Fact]
    public void A_loop_gain_splits_into_open_loop_poles_and_zeros()
    {
        // Ogata, 5th ed., Example 6-1 (from memory): K/(s(s+1)(s+2)) gives A = s^3 + 3s^2 + 2s, B = 1.
        var family = Model([("K", 1.0)], plant: "K/(s*(s+1)*(s+2))").Family("K", Values());
        var split = family.Affine!;
        AssertCoefficients([0.0, 2.0, 3.0, 1.0], split.A, Tol);
        AssertCoefficients([1.0], split.B, Tol);
    }

    [Fact]
    public void A_damper_inside_the_plant_is_affine()
    {
        // Mass-spring-damper with proportional control, common practice: m s^2 + b s + k + Kp, so
        // A = m s^2 + (k + Kp), B = s. Critical damping at b = 2·sqrt(m(k + Kp)): m=1, k+Kp=9 gives b=6, (s+3)^2.
        var model = Model([("b", 0.5), ("m", 1.0), ("k", 4.0), ("Kp", 5.0)], plant: "1/(m*s^2 + b*s + k)", controller: "Kp");
        var family = model.Family("b", Values());
        var split = family.Affine!;
        AssertCoefficients([9.0, 0.0, 1.0], split.A, Tol);
        AssertCoefficients([0.0, 1.0], split.B, Tol);
        AssertCoefficients([9.0, 6.0, 1.0], family.At(6.0), Tol);
    }

    [Fact]
    public void A_mass_under_a_fraction_bar_is_affine_because_nothing_is_cancelled()
    {
        // K/(J s^2) in unity feedback: J s^2 + K, affine in J with A = K, B = s^2.
        var family = Model([("J", 2.0), ("K", 3.0)], plant: "K/(J*s^2)").Family("J", Values());
        AssertCoefficients([3.0], family.Affine!.A, Tol);
        AssertCoefficients([0.0, 0.0, 1.0], family.Affine!.B, Tol);
    }

    [Fact]
    public void An_inertia_written_as_one_over_J_is_affine_once_the_common_power_of_J_is_divided_out()
    {
        // (1/J)/(s(s + B/J)) with C = Kp forms J·(J s^2 + B s + Kp) (nothing cancelled); divided by J it is
        // affine with A = B s + Kp, B = s^2 (by hand), and has the same roots as the characteristic for J != 0.
        var model = Model([("J", 2.0), ("B", 0.5), ("Kp", 3.0)], plant: "(1/J)/(s*(s + B/J))", controller: "Kp");
        var family = model.Family("J", Values());
        AssertCoefficients([3.0, 0.5], family.Affine!.A, Tol);
        AssertCoefficients([0.0, 0.0, 1.0], family.Affine!.B, Tol);
        foreach (double j in new[] { -1.5, 0.25, 4.0 })
        {
            var direct = model.Characteristic(Values(("J", j)));
            var viaFamily = family.At(j).Scale(j);
            for (int k = 0; k <= direct.Degree; k++)
            {
                Assert.Equal(direct[k], viaFamily[k], 1e-12);
            }
        }

        // At J = 0 the divided-out family still has a meaning: B s + Kp, the degree drops.
        AssertCoefficients([3.0, 0.5], family.At(0.0), Tol);
    }

    [Fact]
    public void A_monic_given_characteristic_with_the_parameter_in_denominators_is_affine()
    {
        // s^2 + (B/J) s + K/J: numerator J^2 s^2 + B J s + K J, divided by J: J s^2 + B s + K.
        var model = Model([("J", 2.0), ("B", 0.5), ("K", 3.0)], plant: null, characteristic: "s^2 + (B/J)*s + K/J");
        var split = model.Family("J", Values()).Affine!;
        AssertCoefficients([3.0, 0.5], split.A, Tol);
        AssertCoefficients([0.0, 0.0, 1.0], split.B, Tol);
    }

    [Fact]
    public void Every_parameter_of_the_spindle_example_enters_affinely()
    {
        // Invented example of the plant-file design: P = s(J s + B)(tau s + 1) + Kc·Kt·(s + 20) is of first degree
        // in each of Kc, Kt, J, B and tau.
        (string, double)[] p = [("Kc", 0.8), ("Kt", 0.9), ("J", 0.035), ("B", 0.012), ("tau", 0.004)];
        var model = Model(p, plant: "Kt / ((J*s + B) * (tau*s + 1))", controller: "Kc * (s + 20) / s");
        foreach (string name in new[] { "Kc", "Kt", "J", "B", "tau" })
        {
            Assert.NotNull(model.Family(name, Values()).Affine);
        }

        var split = model.Family("Kc", Values()).Affine!;
        AssertCoefficients([0.0, 0.012, 0.035 + (0.012 * 0.004), 0.035 * 0.004], split.A, 1e-13);
        AssertCoefficients([0.9 * 20, 0.9], split.B, 1e-13);
    }

    [Theory]
    [InlineData("K^2/(s+1)", null, null)]
    [InlineData("1/(s+1)", "K*(s+3)", "K")]
    [InlineData("1/((K*s+1)^2)", null, null)]
    [InlineData("sqrt(K)/(s+1)", null, null)]
    [InlineData("K^0.5/(s+1)", null, null)]
    [InlineData("exp(-K)/(s+1)", null, null)]
    public void A_parameter_squared_in_two_factors_or_under_a_function_is_not_affine(string plant, string? controller, string? sensor)
    {
        var model = Model([("K", 2.0)], plant, controller, sensor);
        var family = model.Family("K", Values());
        Assert.Null(family.Affine);
        foreach (double p in new[] { 0.3, 2.0, 7.5 })
        {
            var expected = model.Characteristic(Values(("K", p)));
            var actual = family.At(p);
            Assert.Equal(expected.Degree, actual.Degree);
            for (int k = 0; k <= expected.Degree; k++)
            {
                Assert.Equal(expected[k], actual[k], 1e-12 * (1 + Math.Abs(expected[k])));
            }
        }
    }

    [Fact]
    public void The_numeric_family_forms_the_loop_at_each_value()
    {
        // (s+1) + K^2 at K = 3 gives s + 10 (by hand).
        var family = Model([("K", 1.0)], plant: "K^2/(s+1)").Family("K", Values());
        AssertCoefficients([10.0, 1.0], family.At(3.0), Tol);
    }

    [Fact]
    public void A_parameter_that_does_not_enter_gives_a_constant_family()
    {
        var family = Model([("K", 1.0), ("unused", 4.0)], plant: "K/(s+1)").Family("unused", Values());
        Assert.Null(family.Affine);
        AssertCoefficients([2.0, 1.0], family.At(100.0), Tol);
    }

    [Fact]
    public void A_given_characteristic_splits_too()
    {
        var model = Model([("Kc", 2.0), ("J", 0.5), ("B", 0.1), ("Kt", 3.0)], plant: null, characteristic: "J*s^2 + (B + Kc)*s + Kt");
        var split = model.Family("Kc", Values()).Affine!;
        AssertCoefficients([3.0, 0.1, 0.5], split.A, Tol);
        AssertCoefficients([0.0, 1.0], split.B, Tol);
        Assert.Null(Model([("K", 2.0)], plant: null, characteristic: "s^2 + K^2*s + 1").Family("K", Values()).Affine);
    }

    [Fact]
    public void Positive_feedback_splits_with_the_opposite_sign()
    {
        var split = Model([("K", 1.0)], plant: "K*(s+2)/((s+3)*(s^2+2*s+2))", feedback: FeedbackSign.Positive)
            .Family("K", Values()).Affine!;
        AssertCoefficients([6.0, 8.0, 5.0, 1.0], split.A, Tol);
        AssertCoefficients([-2.0, -1.0], split.B, Tol);
    }

    [Fact]
    public void Sweeping_a_name_that_is_not_a_parameter_is_an_argument_error()
    {
        Assert.Throws<ArgumentException>(() => Model([("K", 1.0)], plant: "K/(s+1)").Family("Q", Values()));
    }
}
