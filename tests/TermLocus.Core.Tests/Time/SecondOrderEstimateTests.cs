using System.Numerics;
using TermLocus.Core.Time;

namespace TermLocus.Core.Tests.Time;

public class SecondOrderEstimateTests
{
    [Fact]
    public void Dominant_pair_gives_the_standard_second_order_figures()
    {
        // ζ = 0.5, ωn = 2 plus a fast pole at −20: Mp = 16.303 %, ts(2 %) ≈ 4/(ζωn) = 4 s, ts(5 %) ≈ 3 s,
        // tp = π/ωd (K. Ogata, Modern Control Engineering, 5th ed., §5-3, from memory).
        var pair = new Complex(-1.0, Math.Sqrt(3.0));
        var estimate = SecondOrderEstimate.FromPoles([new Complex(-20, 0), pair, Complex.Conjugate(pair)])!;
        Assert.Equal(0.5, estimate.Damping, 1e-15);
        Assert.Equal(2.0, estimate.NaturalFrequency, 1e-15);
        Assert.Equal(16.303, estimate.OvershootPct, 1e-3);
        Assert.Equal(4.0, estimate.SettlingTime2PctSeconds, 1e-15);
        Assert.Equal(3.0, estimate.SettlingTime5PctSeconds, 1e-15);
        Assert.Equal(Math.PI / Math.Sqrt(3.0), estimate.PeakTimeSeconds!.Value, 1e-15);
        Assert.Equal(new[] { pair, Complex.Conjugate(pair) }, estimate.Poles.ToArray());
    }

    [Fact]
    public void Real_dominant_pole_estimates_no_overshoot()
    {
        var estimate = SecondOrderEstimate.FromPoles([new Complex(-5, 5), new Complex(-5, -5), new Complex(-0.5, 0)])!;
        Assert.Equal(0.0, estimate.OvershootPct, 0.0);
        Assert.Null(estimate.PeakTimeSeconds);
        Assert.Equal(8.0, estimate.SettlingTime2PctSeconds, 1e-15); // 4/σ (Ogata, 5th ed., §5-3, from memory)
        Assert.Single(estimate.Poles);
    }

    [Fact]
    public void Delay_adds_to_the_time_estimates()
    {
        var pair = new Complex(-1.0, 1.0);
        var estimate = SecondOrderEstimate.FromPoles([pair, Complex.Conjugate(pair)], 0.25)!;
        Assert.Equal(4.25, estimate.SettlingTime2PctSeconds, 1e-15);
        Assert.Equal(Math.PI + 0.25, estimate.PeakTimeSeconds!.Value, 1e-15);
    }

    [Fact]
    public void Unstable_or_empty_pole_list_has_no_estimate()
    {
        Assert.Null(SecondOrderEstimate.FromPoles([new Complex(0.1, 1), new Complex(0.1, -1)]));
        Assert.Null(SecondOrderEstimate.FromPoles([]));
        Assert.Null(SecondOrderEstimate.Of(StepResponseTests.Lag(-1.0)));
    }
}
