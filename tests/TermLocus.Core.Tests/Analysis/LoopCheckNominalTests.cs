using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Analysis;

/// <summary>The nominal figures a check carries beside its band: the simulated overshoot, and the pole limits alone.</summary>
public class LoopCheckNominalTests
{
    // K/(s(s + a)) with K = 4 closes to 4/(s² + a·s + 4). At a = 2: ζ = 0.5, ωn = 2 rad/s, σ = 1/s, 4/σ = 4 s and the
    // step overshoot is 100·exp(-πζ/√(1 - ζ²)) = 16.30 %; at the corner a = 1.6: ζ = 0.4, overshoot 25.38 %
    // (Ogata, Modern Control Engineering, 5th ed., §5-3, maximum overshoot and 2 % settling time 4/(ζωn); from memory).
    private const string Quadratic = """
        title = "quadratic loop (invented example)"
        [parameters]
        K = { value = 4.0, range = [0.0, 20.0] }
        a = { value = 2.0, tolerance_pct = 20 }
        [loop]
        plant = "K / (s*(s + a))"
        sweep = "K"
        [specs]
        max_settling_time = 5
        max_overshoot_pct = 20
        """;

    // The simulation's peak is a parabola through grid samples; 0.01 percentage points is far above its error
    // (RobustDesignOvershootTests measure it at about 1e-6 relative) and far below the figures' differences.
    private const double OvershootTolerancePct = 0.01;

    private static double TextbookOvershoot(double zeta) => 100 * Math.Exp(-Math.PI * zeta / Math.Sqrt(1 - zeta * zeta));

    [Fact]
    public void The_nominal_overshoot_is_simulated_at_the_values_and_the_band_keeps_the_worst_corner()
    {
        var plant = PlantFileReader.Parse(Quadratic, "quadratic.toml");
        var result = LoopCheck.Run(LoopModel.Create(plant), plant.NominalValues());
        var nominal = Assert.IsType<BandOutcome>(result.NominalOvershoot);
        Assert.Empty(nominal.At);
        Assert.Equal(TextbookOvershoot(0.5), nominal.WorstActual!.Value, OvershootTolerancePct);
        Assert.True(nominal.Met);
        var band = result.Band.Single(b => b.Spec == SpecKind.MaxOvershootPct);
        Assert.Equal(TextbookOvershoot(0.4), band.WorstActual!.Value, OvershootTolerancePct);
        Assert.False(band.Met);
        Assert.Equal(1.6, band.At["a"], 1e-12);
    }

    [Fact]
    public void Pole_specs_alone_judge_settling_as_4_over_sigma_of_the_slowest_pole()
    {
        var plant = PlantFileReader.Parse(Quadratic, "quadratic.toml");
        var report = LoopCheck.PoleSpecs(LoopModel.Create(plant), plant.NominalValues());
        var settling = report.Outcomes.Single(o => o.Spec == SpecKind.MaxSettlingTime);
        Assert.Equal(4.0, settling.WorstActual!.Value, 1e-9);
        Assert.Equal(1.0, settling.WorstMargin, 1e-9);
        Assert.DoesNotContain(report.Outcomes, o => o.Spec == SpecKind.MaxOvershootPct);
    }
}
