using CsCheck;
using TermLocus.Core.Algebra;
using TermLocus.Core.Expressions;
using TermLocus.Core.Plants;
using static TermLocus.Core.Tests.Plants.LoopModelTestPlants;

namespace TermLocus.Core.Tests.Plants;

public class LoopModelPropertyTests
{
    private static readonly Gen<double> Value = Gen.Double[0.05, 20.0];

    [Fact]
    public void The_affine_split_reproduces_the_characteristic_at_every_swept_value()
    {
        // For a loop K·N(s)/D(s) in unity feedback, P = D + K·N (common practice); the split must agree with the
        // characteristic formed directly at any K, and A, B must be D and N.
        var gen = Gen.Select(Value.Array[1, 4], Value.Array[2, 6], Gen.Double[-50.0, 50.0]);
        gen.Sample((zeros, poles, k) =>
        {
            var n = Polynomial.FromRoots(zeros.Select(z => new System.Numerics.Complex(-z, 0)));
            var d = Polynomial.FromRoots(poles.Select(z => new System.Numerics.Complex(-z, 0)));
            if (n.Degree > d.Degree)
            {
                return;
            }

            var model = Model([("K", 1.0)], plant: $"K*({ExpressionPrinter.Print(n)})/({ExpressionPrinter.Print(d)})");
            var family = model.Family("K", Values());
            Assert.NotNull(family.Affine);
            Assert.Equal(d, family.Affine!.A);
            Assert.Equal(n, family.Affine!.B);
            AssertClose(model.Characteristic(Values(("K", k))), family.At(k));
        });
    }

    [Fact]
    public void A_physical_coefficient_splits_exactly_and_agrees_with_direct_evaluation()
    {
        var gen = Gen.Select(Value, Value, Value, Value, Gen.Double[-10.0, 10.0]);
        gen.Sample((m, b, k, kp, sweptB) =>
        {
            var model = Model([("b", b), ("m", m), ("k", k), ("Kp", kp)], plant: "1/(m*s^2 + b*s + k)", controller: "Kp*(s + 2)/(s + 10)");
            var family = model.Family("b", Values());
            Assert.NotNull(family.Affine);
            AssertClose(model.Characteristic(Values(("b", sweptB))), family.At(sweptB));
        });
    }

    [Fact]
    public void A_non_affine_family_agrees_with_direct_evaluation()
    {
        var gen = Gen.Select(Value, Value, Gen.Double[-10.0, 10.0]);
        gen.Sample((tau, kc, swept) =>
        {
            var model = Model([("tau", tau), ("Kc", kc)], plant: "1/((tau*s + 1)^2 * s)", controller: "Kc*(tau*s + 2)");
            var family = model.Family("tau", Values());
            Assert.Null(family.Affine);
            AssertClose(model.Characteristic(Values(("tau", swept))), family.At(swept));
        });
    }

    private static void AssertClose(Polynomial expected, Polynomial actual)
    {
        Assert.Equal(expected.Degree, actual.Degree);
        double scale = 1e-12 * (1 + expected.MaxAbsCoefficient());
        for (int i = 0; i <= expected.Degree; i++)
        {
            Assert.Equal(expected[i], actual[i], scale);
        }
    }
}
