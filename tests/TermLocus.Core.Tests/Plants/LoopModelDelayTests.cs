using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;
using TermLocus.Core.Time;
using static TermLocus.Core.Tests.Plants.LoopModelTestPlants;

namespace TermLocus.Core.Tests.Plants;

public class LoopModelDelayTests
{
    private const double Tol = 1e-12;

    [Fact]
    public void First_order_lag_with_first_order_pade_delay_gives_the_hand_derived_quadratic()
    {
        // e^{−sT} ≈ (1 − sT/2)/(1 + sT/2), the [1/1] Padé approximant (Franklin, Powell & Emami-Naeini, Feedback
        // Control of Dynamic Systems, §5.6.3, from memory). With K/(s + 1): 1 + K(1 − sT/2)/((s + 1)(1 + sT/2)) has
        // numerator (s + 1)(1 + sT/2) + K(1 − sT/2) = (T/2)s² + (1 + T/2 − KT/2)s + (1 + K) (expanded by hand).
        const double k = 1.5, t = 0.4;
        var model = Delayed([("K", k)], "K/(s+1)", t, options: new LoopModelOptions { DelayOrder = 1 });
        AssertCoefficients([1 + k, 1 + (t / 2) - (k * t / 2), t / 2], model.Characteristic(Values()), Tol);
        Assert.Equal(PlaneKind.S, model.Plane.Kind);
        Assert.Equal(t, model.DelaySeconds);

        // Its critical gain, where the s coefficient vanishes: K = 1 + 2/T (Routh–Hurwitz on the quadratic, by hand).
        var roots = PolynomialRoots.Find(model.Characteristic(Values(("K", 1 + (2 / t)))));
        Assert.All(roots, r => Assert.Equal(0.0, r.Real, 1e-9));
    }

    [Fact]
    public void The_default_third_order_approximant_adds_three_poles_and_approaches_the_true_critical_gain()
    {
        // K e^{−s}/(s + 1): the loop is at the edge of stability where the phase −atan ω − ω reaches −π and the gain
        // K/√(1 + ω²) is 1: ω = 2.02876, K = 2.26183 (the phase-crossover condition, common practice; solved by
        // Newton's method here). The [3/3] approximant's phase error at ωT = 2 is about 1e-3 rad, so its critical gain
        // lies within 1e-3 of the true one; [1/1] gives 3, far off (measured 2.26272 for [3/3]).
        var model = Delayed([("K", 1.0)], "K/(s+1)", 1.0);
        Assert.Equal(4, model.Characteristic(Values()).Degree);
        Assert.Equal(2.261826, CriticalGain(model, 0.5, 5.0), 1e-3);
        var precise = Delayed([("K", 1.0)], "K/(s+1)", 1.0, options: new LoopModelOptions { DelayOrder = 10 });
        Assert.Equal(2.2618263341, CriticalGain(precise, 0.5, 5.0), 1e-8);
    }

    [Fact]
    public void Loop_gain_and_reference_to_output_carry_the_approximant()
    {
        // C·G·P_T and C·G·P_T/(1 + C·G·H·P_T) = N_G·N_P/P (common practice, with P_T = N_P/D_P).
        const double t = 0.2;
        var model = Delayed([("K", 2.0)], "K/(s*(s+3))", t);
        var pade = PadeApproximant.Delay(t);
        var gain = model.LoopGain(Values())!;
        AssertCoefficients([.. (pade.Numerator * 2.0).Coefficients], gain.Numerator, Tol);
        AssertCoefficients([.. (Polynomial.FromAscending(0, 3, 1) * pade.Denominator).Coefficients], gain.Denominator, Tol);
        var closed = model.ReferenceToOutput(Values())!;
        Assert.Equal(model.Characteristic(Values()), closed.Denominator);
        AssertCoefficients([.. (pade.Numerator * 2.0).Coefficients], closed.Numerator, Tol);
        Assert.Equal(1.0, closed.Numerator.Evaluate(0.0) / closed.Denominator.Evaluate(0.0), Tol);
    }

    [Fact]
    public void A_gain_swept_through_a_delayed_loop_stays_affine()
    {
        // The approximant is free of K, so P = D_G·D_P + K·N_G·N_P: affine in K (common practice).
        var model = Delayed([("K", 2.0)], "K/(s*(s+3))", 0.2, controller: "(s+1)/(s+10)");
        var family = model.Family("K", Values());
        Assert.NotNull(family.Affine);
        foreach (double k in new[] { 0.5, 3.0, 40.0 })
        {
            AssertCoefficients([.. model.Characteristic(Values(("K", k))).Coefficients], family.At(k), 1e-9);
        }

        var pade = PadeApproximant.Delay(0.2);
        AssertCoefficients([.. (Polynomial.FromAscending(0, 3, 1) * Polynomial.FromAscending(10, 1) * pade.Denominator).Coefficients], family.Affine!.A, Tol);
    }

    [Fact]
    public void Hidden_poles_ignore_the_approximant()
    {
        // (s + 2) cancelled between controller and plant stays a closed-loop pole (plant-file design); the Padé
        // factor is not one of the user's parts and cancels nothing.
        var model = Delayed([("K", 1.0)], "K/((s+2)*(s+1))", 0.1, controller: "(s+2)/s");
        var hidden = model.HiddenPoles(Values());
        Assert.Single(hidden);
        Assert.Equal(-2.0, hidden[0].Real, 1e-9);
        Assert.Contains(PolynomialRoots.Find(model.Characteristic(Values())), r => Complex.Abs(r + 2.0) < 1e-7);
    }

    [Fact]
    public void Delay_options_and_values_out_of_range_are_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Delayed([("K", 1.0)], "K/s", 0.1, options: new LoopModelOptions { DelayOrder = 0 }));
        Assert.Throws<ArgumentOutOfRangeException>(() => Delayed([("K", 1.0)], "K/s", 0.1, options: new LoopModelOptions { DelayOrder = 11 }));
        Assert.Throws<ArgumentException>(() => Delayed([("K", 1.0)], "K/s", -0.1));
        Assert.Throws<ArgumentException>(() => Delayed([("K", 1.0)], "K/s", double.NaN));
        var zero = Delayed([("K", 1.0)], "K/(s+1)", 0.0);
        AssertCoefficients([2.0, 1.0], zero.Characteristic(Values()), Tol);
    }

    [Fact]
    public void A_delay_with_a_given_characteristic_is_a_located_error()
    {
        var plant = Loop([("K", 1.0)], plant: null, characteristic: "s^2 + s + K", delay: 0.1);
        var e = Assert.Throws<PlantFileException>(() => LoopModel.Create(plant));
        Assert.Equal(1, e.Error.Position.Column);
        Assert.Contains("delay", e.Error.Message, StringComparison.Ordinal);
    }

    /// <summary>The gain where the last root crosses into the right half-plane, by bisection.</summary>
    internal static double CriticalGain(LoopModel model, double stable, double unstable)
    {
        for (int i = 0; i < 80; i++)
        {
            double mid = 0.5 * (stable + unstable);
            bool ok = PolynomialRoots.Find(model.Characteristic(Values(("K", mid)))).All(model.Plane.IsStable);
            (ok ? ref stable : ref unstable) = mid;
        }

        return stable;
    }
}
