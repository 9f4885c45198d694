using System.Numerics;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Plants;

/// <summary>
/// The demo plants' stories (pass, fail, where the loop goes unstable) checked through reader + loop model. Closed-loop
/// poles come from MathNet's polynomial root finder (an implementation outside the project); the spec rules are those
/// of plant-file.md ([specs]: ζ = σ/ωn, time to half ln2/σ, settling 4/σ). The expected outcomes were first found with
/// a throwaway script that built each characteristic polynomial by hand.
/// </summary>
public sealed class DemoPlantLoopTests
{
    private const double Relative = 1e-12;

    private static LoopModel Model(string file) => LoopModel.Create(PlantFileReader.Read(Path.Combine(AppContext.BaseDirectory, "DemoPlants", file)));

    private static Complex[] Poles(LoopModel model, params (string Name, double Value)[] values)
    {
        var coefficients = model.Characteristic(values.ToDictionary(v => v.Name, v => v.Value)).Coefficients.ToArray();
        return new MathNet.Numerics.Polynomial(coefficients).Roots();
    }

    private static bool MeetsSpecs(Specs specs, Complex[] poles) => poles.All(p =>
    {
        var wn = p.Magnitude;
        var sigma = -p.Real;
        return (specs.MinDamping is not { } z || (wn > 0 && sigma / wn >= z))
            && (specs.MaxTimeToHalfSeconds is not { } h || sigma >= Math.Log(2) / h)
            && (specs.MaxSettlingTimeSeconds is not { } t || sigma >= 4 / t)
            && (specs.MinDecayRate is not { } d || sigma >= d)
            && (specs.MaxNaturalFrequency is not { } wmax || wn <= wmax)
            && (specs.MinNaturalFrequency is not { } wmin || wn >= wmin);
    });

    private static bool Stable(Complex[] poles) => poles.All(p => p.Real < 0);

    [Theory]
    [InlineData("conveyor-speed.toml")]
    [InlineData("gimbal-sensor-filter.toml")]
    [InlineData("press-cylinder-position.toml")]
    [InlineData("reflow-oven-zone.toml")]
    public void A_passing_demo_meets_its_specs_at_nominal_across_its_band(string file)
    {
        var model = Model(file);
        var varied = model.Plant.FindParameter(model.Plant.Loop.Vary!)!;

        foreach (var value in new[] { varied.Band!.Value.Low, varied.Value, varied.Band!.Value.High })
        {
            Assert.True(MeetsSpecs(model.Plant.Specs, Poles(model, (varied.Name, value))), $"{file} at {varied.Name} = {value}");
        }
    }

    [Fact]
    public void The_magnetic_bearing_fails_at_nominal_and_passes_at_the_gain_its_note_suggests()
    {
        var model = Model("magnetic-bearing.toml");

        Assert.False(MeetsSpecs(model.Plant.Specs, Poles(model)));
        foreach (var ks in new[] { 3.4e5, 4.0e5, 4.6e5 })
        {
            Assert.True(MeetsSpecs(model.Plant.Specs, Poles(model, ("Kp", 3500), ("Ks", ks))), $"Ks = {ks}");
        }
    }

    [Theory]
    [InlineData("press-cylinder-position.toml", 110.0, 120.0)]
    [InlineData("gimbal-sensor-filter.toml", 30.0, 25.0)]
    [InlineData("reflow-oven-zone.toml", 180.0, 200.0)]
    [InlineData("magnetic-bearing.toml", 10500.0, 11000.0)]
    [InlineData("magnetic-bearing.toml", 2100.0, 1900.0)]
    public void The_swept_range_crosses_into_instability_where_the_note_says(string file, double stableAt, double unstableAt)
    {
        var model = Model(file);
        var sweep = model.Plant.Loop.Sweep;

        Assert.True(model.Plant.SweepRange.Contains(unstableAt));
        Assert.True(Stable(Poles(model, (sweep, stableAt))));
        Assert.False(Stable(Poles(model, (sweep, unstableAt))));
    }

    [Fact]
    public void The_conveyor_characteristic_matches_the_hand_derived_polynomial()
    {
        // s(Js + B)(tau_i s + 1) + Kp Kt (s + wi), expanded by hand from 1 + C·G = 0.
        const double kp = 6, kt = 1.2, wi = 8, j = 0.42, b = 0.08, tau = 0.004;
        double[] expected = [kp * kt * wi, b + kp * kt, j + b * tau, j * tau];
        var model = Model("conveyor-speed.toml");

        var actual = model.Characteristic(new Dictionary<string, double>()).Coefficients;

        Assert.Equal(expected.Length, actual.Length);
        var scale = actual[^1] / expected[^1];
        for (var k = 0; k < expected.Length; k++)
        {
            Assert.Equal(expected[k], actual[k] / scale, expected[k] * Relative);
        }
    }

    [Fact]
    public void The_oven_family_is_not_affine_and_the_gimbal_family_is()
    {
        var oven = Model("reflow-oven-zone.toml");
        var gimbal = Model("gimbal-sensor-filter.toml");

        Assert.Null(oven.Family("tau", new Dictionary<string, double>()).Affine);
        Assert.NotNull(gimbal.Family("wf", new Dictionary<string, double>()).Affine);
    }
}
