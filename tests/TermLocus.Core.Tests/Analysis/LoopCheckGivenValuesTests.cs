using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Analysis;

/// <summary>
/// The band check judges the values it is given, not only the tolerance box: a toleranced value given outside its
/// band must not pass because the box around it is fine.
/// </summary>
public class LoopCheckGivenValuesTests
{
    // K/(s(s + a)) in unity negative feedback: s^2 + a·s + K, so ωn = √K and ζ = a/(2√K) (standard second-order
    // form; Ogata, Modern Control Engineering, 5th ed., §5-3, from memory). With K = 1 and a in [1.2, 2.0],
    // ζ runs over [0.6, 1.0]: min_damping 0.5 holds across the band.
    private const string TypeOneLoop = """
        title = "type-one loop with a toleranced pole"
        [parameters]
        K = { value = 1.0, range = [0.0, 10.0] }
        a = { value = 1.6, band = [1.2, 2.0] }
        [loop]
        plant = "K / (s*(s + a))"
        sweep = "K"
        [specs]
        min_damping = 0.5
        """;

    private static LoopCheckResult CheckWith(double a)
    {
        var plant = PlantFileReader.Parse(TypeOneLoop, "nominal-test.toml");
        return LoopCheck.Run(LoopModel.Create(plant), plant.NominalValues().SetItem("a", a));
    }

    [Fact]
    public void Inside_the_band_the_worst_damping_is_at_the_low_corner()
    {
        var result = CheckWith(1.6);
        Assert.True(result.Passed);
        var damping = Assert.Single(result.Band);
        Assert.Equal(1.2 / 2.0, damping.WorstActual!.Value, 1e-9); // ζ = a/(2√K) at a = 1.2
    }

    [Fact]
    public void A_value_outside_the_band_is_judged_itself_and_fails()
    {
        // a = 0.4: ζ = 0.4/2 = 0.2 at the point checked, below 0.5, though every point of the band [1.2, 2] meets it.
        var result = CheckWith(0.4);
        Assert.False(result.Passed);
        var damping = Assert.Single(result.Band);
        Assert.False(damping.Met);
        Assert.Equal(0.2, damping.WorstActual!.Value, 1e-9);
        Assert.Equal(0.4, damping.At["a"], 0.0);
        Assert.Equal(0.2, result.WorstDamping!.Value, 1e-9);
    }

    [Fact]
    public void An_unstable_value_outside_the_band_is_not_stable_across_the_band()
    {
        // a = -0.5: s^2 - 0.5 s + 1 has roots with real part +0.25 (Routh–Hurwitz: a sign change in the first column).
        var result = CheckWith(-0.5);
        Assert.False(result.StableAcrossBand);
        Assert.False(result.Passed);
        Assert.Equal(-0.25, result.WorstDecayRate!.Value, 1e-9);
    }
}
