using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;
using TermLocus.Core.Time;
using static TermLocus.Core.Tests.Plants.LoopModelTestPlants;

namespace TermLocus.Core.Tests.Plants;

/// <summary>Sampled loops through <see cref="LoopResponse"/>: the plant output between samples and at them.</summary>
public class LoopResponseSampledTests
{
    public static TheoryData<string, double, string?, string?, double?, FeedbackSign, double> Loops => new()
    {
        // plant, sample time, controller, sensor, delay, feedback, K
        { "K/(s*(s+1))", 1.0, null, null, null, FeedbackSign.Negative, 1.0 },
        { "K/s", 1.0, null, "1/(s+1)", null, FeedbackSign.Negative, 0.8 },
        { "(s+2)/(s+1)", 0.5, "K*(z - 0.5)/(z - 0.2)", null, null, FeedbackSign.Negative, 0.3 }, // feed-through both sides
        { "K/(s*(s+1))", 1.0, null, null, 1.0, FeedbackSign.Negative, 0.5 },                     // one whole sample
        { "K/(s+1)", 0.5, null, null, 0.3, FeedbackSign.Negative, 1.5 },                          // remainder only
        { "(s+3)/(s+1)", 0.5, "K", "2/(s+4)", 0.2, FeedbackSign.Negative, 0.4 },                // feed-through, remainder
        { "K/(s^2 + 0.4*s + 4)", 0.25, "(z - 0.3)/(z - 0.9)", "1/(0.05*s + 1)", 0.325, FeedbackSign.Negative, 0.8 },
        { "1/(s+2)", 0.2, "K", null, null, FeedbackSign.Positive, 1.2 },
    };

    [Theory]
    [MemberData(nameof(Loops))]
    public void Sample_instants_equal_the_closed_loop_in_z(
        string plant, double t, string? controller, string? sensor, double? delay, FeedbackSign feedback, double k)
    {
        // The z-plane closed loop C·G_τ/(1 ± C·(G·H)_τ) gives the output at the instants exactly (Ogata, Discrete-Time
        // Control Systems, 2nd ed., ch. 3, block diagrams with samplers, from memory); the hybrid simulation must
        // pass through the same values, whatever the delay, sensor, feed-through or sign.
        var model = LoopModel.Create(Loop([("K", k)], plant, controller, sensor, feedback, delay: delay, sampleTime: t));
        var response = LoopResponse.Analyse(model, Values());
        Assert.Equal(ResponseMethod.SampledBetweenSamples, response.Method);
        var samples = response.SampleTrace!;
        var inZ = StepResponse.SimulateSampled(model.ReferenceToOutput(Values())!, t, samples.Count);
        for (int i = 0; i < samples.Count; i++)
        {
            Assert.Equal(i * t, samples.Times[i], 1e-12);
            Assert.Equal(inZ.Outputs[i], samples.Outputs[i], 1e-9);
            Assert.Equal(samples.Outputs[i], response.Trace!.Outputs[i * response.PointsPerSample!.Value]);
        }
    }

    [Fact]
    public void The_figures_are_those_of_the_output_between_samples()
    {
        // Ogata's motor loop, K = 1, T = 1 s: 39.96 % at the samples (Discrete-Time Control Systems, 2nd ed., ch. 4,
        // from memory), 44.88 % between them (brute-force integration in HeldLoopResponseTests).
        var response = LoopResponse.Analyse(Sampled([("K", 1.0)], "K/(s*(s+1))", 1.0), Values());
        Assert.Equal(10, response.PointsPerSample);
        Assert.Equal(((response.SampleTrace!.Count - 1) * 10) + 1, response.Trace!.Count);
        Assert.Equal(44.88, response.Figures!.OvershootPct!.Value, 1e-2);
        Assert.Equal(39.96, response.SampleFigures!.OvershootPct!.Value, 1e-2);
        Assert.InRange(response.Figures.PeakTimeSeconds!.Value, 3.0, 4.0);
    }

    [Fact]
    public void The_overshoot_limit_is_checked_on_the_peak_between_samples()
    {
        // 42 % lies between the sampled peak (39.96 %) and the one between samples (44.88 %), above.
        var plant = Loop([("K", 1.0)], "K/(s*(s+1))", sampleTime: 1.0) with { Specs = new Specs(MaxOvershootPct: 42) };
        var model = LoopModel.Create(plant);
        var outcome = OvershootCheck.Worst(model, Values(), new ToleranceBox([]))!;
        Assert.Equal(44.88, outcome.WorstActual!.Value, 1e-2);
        Assert.False(outcome.Met);
    }

    [Fact]
    public void A_ripple_the_samples_hide_is_simulated_until_it_dies_out()
    {
        // The deadbeat motor loop of HeldLoopResponseTests: y(kT) = 1 from k = 1, but u_k alternates like (−0.718)^k
        // and the output ripples between samples (Ogata, Discrete-Time Control Systems, 2nd ed., ch. 6, from
        // memory). The response runs until the controller output settles too: 8 time constants of
        // |z| = e − 2 = 0.718, 8/ln(1/0.718) = 24 samples (ResponseGrid.ForSampled's rule).
        var model = Sampled(
            [("K", Math.E)], "1/(s*(s+1))", 1.0, controller: "K*(z - 0.36787944117144233)/(z + 0.71828182845904509)");
        var response = LoopResponse.Analyse(model, Values());
        Assert.True(response.SampleTrace!.Count >= 25, $"{response.SampleTrace.Count} samples");
        Assert.Equal(0.0, response.SampleFigures!.OvershootPct!.Value, 1e-6);
        Assert.InRange(response.SampleFigures.SettlingTime2PctSeconds!.Value, 0.9, 1.0);
        Assert.True(response.Figures!.OvershootPct > 5.0);
        Assert.True(response.Figures.SettlingTime2PctSeconds > 5.0);
    }

    [Fact]
    public void A_controller_with_more_zeros_than_poles_gives_the_instants_alone_and_says_why()
    {
        // C = z leads the output by a sample: the closed loop z·G/(1 + z·G) is proper (G(z) has one more pole than
        // zero; hold equivalent, common practice) but the controller cannot run in real time.
        var response = LoopResponse.Analyse(Sampled([("K", 0.2)], "K/(s*(s+1))", 1.0, controller: "z"), Values());
        Assert.Equal(ResponseMethod.Sampled, response.Method);
        Assert.Same(response.Trace, response.SampleTrace);
        Assert.Null(response.PointsPerSample);
        Assert.Contains("not causal", response.Warning, StringComparison.Ordinal);
    }

    [Fact]
    public void Continuous_loops_have_no_sample_series()
    {
        var response = LoopResponse.Analyse(Model([("K", 4.0)], "K/(s*(s+2))"), Values());
        Assert.Null(response.SampleTrace);
        Assert.Null(response.SampleFigures);
        Assert.Null(response.PointsPerSample);
    }
}
