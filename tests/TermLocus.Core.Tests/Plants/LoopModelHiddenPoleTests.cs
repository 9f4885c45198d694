using System.Numerics;
using TermLocus.Core.Algebra;
using static TermLocus.Core.Tests.Plants.LoopModelTestPlants;

namespace TermLocus.Core.Tests.Plants;

public class LoopModelHiddenPoleTests
{
    private const double Tol = 1e-9;

    [Fact]
    public void A_pole_cancelled_inside_the_plant_is_reported_and_is_a_closed_loop_pole()
    {
        // Plant-file design, Meaning: K(s+1)/((s+1)(s+2)) hides the pole at -1; the closed loop is (s+1)(s+2+K).
        var model = Model([("K", 3.0)], plant: "K*(s+1)/((s+1)*(s+2))");
        var hidden = Assert.Single(model.HiddenPoles(Values()));
        Assert.Equal(-1.0, hidden.Real, Tol);
        Assert.Equal(0.0, hidden.Imaginary, Tol);

        var closedLoop = PolynomialRoots.Find(model.Characteristic(Values()));
        Assert.Contains(closedLoop, r => Complex.Abs(r - hidden) < Tol);
        Assert.Contains(closedLoop, r => Complex.Abs(r - new Complex(-5, 0)) < Tol);
    }

    [Fact]
    public void A_controller_zero_cancelling_a_plant_pole_is_reported()
    {
        // Common practice: a PI zero placed on a plant pole, C = (s+3)/s, G = K/((s+3)(s+5)).
        var hidden = Model([("K", 2.0)], plant: "K/((s+3)*(s+5))", controller: "(s+3)/s").HiddenPoles(Values());
        Assert.Equal(-3.0, Assert.Single(hidden).Real, Tol);
    }

    [Fact]
    public void A_sensor_pole_cancelled_by_a_plant_zero_is_reported()
    {
        var hidden = Model([("K", 2.0)], plant: "K*(s+4)/(s*(s+1))", sensor: "1/(s+4)").HiddenPoles(Values());
        Assert.Equal(-4.0, Assert.Single(hidden).Real, Tol);
    }

    [Fact]
    public void A_cancelled_complex_pair_is_reported_as_a_pair()
    {
        // s^2 + 2s + 5 has roots -1 ± 2j (quadratic formula).
        var hidden = Model([("K", 1.0)], plant: "K*(s^2 + 2*s + 5)/((s^2 + 2*s + 5)*(s + 1))").HiddenPoles(Values());
        Assert.Equal(2, hidden.Length);
        Assert.Equal(new Complex(-1, -2).Real, hidden[0].Real, Tol);
        Assert.Equal(-2.0, hidden[0].Imaginary, Tol);
        Assert.Equal(2.0, hidden[1].Imaginary, Tol);
    }

    [Fact]
    public void A_double_cancellation_is_reported_twice_and_a_single_one_once()
    {
        var twice = Model([("K", 1.0)], plant: "K*(s+1)^2/((s+1)^2*(s+4))").HiddenPoles(Values());
        Assert.Equal(2, twice.Length);
        Assert.All(twice, r => Assert.Equal(-1.0, r.Real, 1e-7));

        var once = Model([("K", 1.0)], plant: "K*(s+1)/((s+1)^2*(s+4))").HiddenPoles(Values());
        Assert.Equal(-1.0, Assert.Single(once).Real, 1e-7);
    }

    [Fact]
    public void No_cancellation_no_hidden_pole()
    {
        Assert.Empty(Model([("K", 1.0)], plant: "K/(s*(s+1)*(s+2))").HiddenPoles(Values()));
        Assert.Empty(Model([("K", 1.0)], plant: "K*(s+1.01)/((s+1)*(s+2))").HiddenPoles(Values()));
    }

    [Fact]
    public void With_zero_gain_nothing_is_hidden()
    {
        Assert.Empty(Model([("K", 0.0)], plant: "K*(s+1)/((s+1)*(s+2))").HiddenPoles(Values()));
    }

    [Fact]
    public void A_cancellation_that_depends_on_a_parameter_is_found_at_that_value()
    {
        var model = Model([("K", 1.0), ("a", 2.0)], plant: "K*(s+a)/((s+1)*(s+2))");
        Assert.Equal(-2.0, Assert.Single(model.HiddenPoles(Values())).Real, Tol);
        Assert.Empty(model.HiddenPoles(Values(("a", 3.0))));
    }
}
