using System.Globalization;
using System.Numerics;
using CsCheck;
using TermLocus.Core.Algebra;
using TermLocus.Core.Expressions;
using TermLocus.Core.Plants;
using static TermLocus.Core.Tests.Plants.LoopModelTestPlants;

namespace TermLocus.Core.Tests.Plants;

public class LoopModelSampledPropertyTests
{
    private static readonly Gen<double> Rate = Gen.Double[0.2, 10.0];

    [Fact]
    public void A_gain_through_the_hold_splits_exactly_and_agrees_with_direct_evaluation()
    {
        // (K·G)_hold = K·G_hold (the hold equivalent is linear in G; definition): the affine family must agree with
        // the loop formed and discretised directly at any K, delays included.
        var gen = Gen.Select(Rate.Array[1, 2], Rate.Array[2, 4], Gen.Double[0.01, 0.5], Gen.Double[0.0, 3.0], Gen.Double[-20.0, 20.0]);
        gen.Sample((zeros, poles, t, delaySamples, k) =>
        {
            var plant = $"K*({Print(zeros)})/({Print(poles)})";
            var model = Sampled([("K", 1.0)], plant, t, delay: delaySamples * t);
            var family = model.Family("K", Values());
            Assert.NotNull(family.Affine);
            AssertClose(model.Characteristic(Values(("K", k))), family.At(k));
        });
    }

    [Fact]
    public void A_delayed_continuous_loop_splits_exactly_and_agrees_with_direct_evaluation()
    {
        var gen = Gen.Select(Rate.Array[2, 4], Gen.Double[0.01, 2.0], Gen.Int[1, 10], Gen.Double[-20.0, 20.0]);
        gen.Sample((poles, delay, order, k) =>
        {
            var model = Delayed([("K", 1.0)], $"K/({Print(poles)})", delay, options: new LoopModelOptions { DelayOrder = order });
            var family = model.Family("K", Values());
            Assert.NotNull(family.Affine);
            Assert.Equal(poles.Length + order, family.At(k).Degree);
            AssertClose(model.Characteristic(Values(("K", k))), family.At(k));
        });
    }

    [Fact]
    public void Sampling_keeps_the_steady_state_of_a_stable_loop()
    {
        // A hold equivalent has the plant's steady-state gain, G_hold(1) = G(0) (step invariance, definition), so a sampled loop
        // that is stable settles where the continuous loop K·G(0)/(1 + K·G(0)) would.
        var gen = Gen.Select(Rate.Array[1, 3], Gen.Double[0.01, 0.3], Gen.Double[0.05, 2.0]);
        gen.Sample((poles, t, k) =>
        {
            var den = Polynomial.FromRoots(poles.Select(p => new Complex(-p, 0)));
            var model = Sampled([("K", k)], "K*" + den[0].ToString("R", CultureInfo.InvariantCulture) + $"/({Print(poles)})", t);
            var response = LoopResponse.Analyse(model, Values());
            if (response.SteadyState is double final)
            {
                Assert.Equal(k / (1 + k), final, 1e-9);
            }
        });
    }

    private static string Print(double[] rates) =>
        ExpressionPrinter.Print(Polynomial.FromRoots(rates.Select(r => new Complex(-r, 0))));

    private static void AssertClose(Polynomial expected, Polynomial actual)
    {
        Assert.Equal(expected.Degree, actual.Degree);
        double scale = 1e-10 * (1 + expected.MaxAbsCoefficient());
        for (int i = 0; i <= expected.Degree; i++)
        {
            Assert.Equal(expected[i], actual[i], scale);
        }
    }
}
