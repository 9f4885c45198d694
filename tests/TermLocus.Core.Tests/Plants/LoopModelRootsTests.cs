using System.Numerics;
using TermLocus.Core.Plants;
using static TermLocus.Core.Tests.Plants.LoopModelTestPlants;

namespace TermLocus.Core.Tests.Plants;

/// <summary>
/// <see cref="LoopModel.CharacteristicRoots"/> (one eigenvalue solve, shared with the check that the roots are
/// computable) against MathNet's polynomial root finder, an implementation outside the project.
/// </summary>
public sealed class LoopModelRootsTests
{
    private const double Relative = 1e-9;

    private static Complex[] MathNetRoots(LoopModel model, Dictionary<string, double> values) =>
        [.. new MathNet.Numerics.Polynomial([.. model.Characteristic(values).Coefficients]).Roots()
            .OrderBy(r => r.Real).ThenBy(r => r.Imaginary)];

    private static void AssertSameRoots(Complex[] expected, IReadOnlyList<Complex> actual)
    {
        Assert.Equal(expected.Length, actual.Count);
        for (int i = 0; i < expected.Length; i++)
        {
            double scale = Math.Max(1.0, expected[i].Magnitude);
            Assert.True(Complex.Abs(expected[i] - actual[i]) <= Relative * scale, $"root {i}: {expected[i]} vs {actual[i]}");
        }
    }

    [Theory]
    [InlineData(0.3)]
    [InlineData(6.0)]
    [InlineData(40.0)]
    public void A_third_order_loop_has_the_roots_mathnet_finds(double kp)
    {
        // Invented PI speed loop (the conveyor demo's shape): Kp·(s + 8)/s · 1.2/((J s + 0.08)(0.004 s + 1)).
        var model = Model(
            [("Kp", kp), ("J", 0.42)],
            plant: "1.2 / ((J*s + 0.08) * (0.004*s + 1))",
            controller: "Kp * (s + 8) / s");
        var values = Values(("Kp", kp), ("J", 0.42));

        var roots = model.CharacteristicRoots(values);

        Assert.Equal(0, roots.InfiniteCount);
        AssertSameRoots(MathNetRoots(model, values), roots.Finite);
    }

    [Fact]
    public void A_vanishing_leading_coefficient_counts_a_root_at_infinity()
    {
        // eps·s^3 + s^2 + 2 s + 1 with eps negligible: as eps → 0 one root runs off to infinity and the others tend to
        // the double root -1 of (s + 1)^2 (common practice: a degree drop of the characteristic polynomial).
        var model = Model([("eps", 1e-20)], plant: null, characteristic: "eps*s^3 + s^2 + 2*s + 1");

        var roots = model.CharacteristicRoots(Values(("eps", 1e-20)));

        Assert.Equal(1, roots.InfiniteCount);
        Assert.Equal(2, roots.Finite.Length);
        Assert.All(roots.Finite, r => Assert.True(Complex.Abs(r + 1) < 1e-6, $"{r} is not near -1"));
    }
}
