using TermLocus.Core.Plants;
using static TermLocus.Core.Tests.Plants.LoopModelTestPlants;

namespace TermLocus.Core.Tests.Plants;

public class LoopResponseTests
{
    [Fact]
    public void Continuous_second_order_loop_matches_the_standard_figures()
    {
        // 4/(s(s + 2)) in unity feedback is ωn²/(s² + 2ζωn s + ωn²) with ωn = 2, ζ = 0.5: overshoot
        // 100·e^{−ζπ/√(1−ζ²)} = 16.30 %, peak time π/ωd = π/√3 = 1.8138 s (Ogata, Modern Control Engineering, 5th ed., §5-3, from memory).
        var response = LoopResponse.Analyse(Model([("K", 4.0)], "K/(s*(s+2))"), Values());
        Assert.True(response.IsAvailable);
        Assert.Equal(ResponseMethod.Continuous, response.Method);
        Assert.True(response.IsStable);
        Assert.Equal(1.0, response.SteadyState!.Value, 1e-12);
        Assert.Equal(16.303, response.Figures!.OvershootPct!.Value, 1e-3);
        Assert.Equal(Math.PI / Math.Sqrt(3), response.Figures.PeakTimeSeconds!.Value, 1e-4);
        Assert.Equal(0.5, response.Estimate!.Damping, 1e-12);
        Assert.Null(response.Warning);
    }

    [Fact]
    public void Integrator_loop_with_delay_is_simulated_exactly_inside_the_loop()
    {
        // y' = K(1 − y(t − T)): by the method of steps y = t − T on [T, 2T] and t − T − (t − 2T)²/2 on [2T, 3T]; with
        // K = T = 1 the peak is y(3) = 1.5 (y' = 1 − y(2) = 0 there), overshoot 50 %, rise time 1.9 − 1.1 = 0.8 s
        // (worked by hand; Bellman & Cooke, Differential-Difference Equations, 1963, ch. 3, method of steps, from memory).
        var response = LoopResponse.Analyse(Delayed([("K", 1.0)], "K/s", 1.0), Values());
        Assert.Equal(ResponseMethod.ExactDelay, response.Method);
        Assert.True(response.IsStable);
        var trace = response.Trace!;
        for (int j = 0; j < trace.Count && trace.Times[j] <= 3.0; j++)
        {
            double t = trace.Times[j];
            double expected = t <= 1 ? 0 : t <= 2 ? t - 1 : t - 1 - ((t - 2) * (t - 2) / 2);
            Assert.Equal(expected, trace.Outputs[j], 1e-11);
        }

        Assert.Equal(1.0, response.SteadyState!.Value, 1e-12);
        Assert.Equal(50.0, response.Figures!.OvershootPct!.Value, 1e-4);
        Assert.Equal(3.0, response.Figures.PeakTimeSeconds!.Value, 1e-3);
        Assert.Equal(0.8, response.Figures.RiseTimeSeconds!.Value, 1e-9);
    }

    [Fact]
    public void Integrator_loop_with_too_much_delay_has_no_figures()
    {
        // K e^{−sT}/s is stable exactly for KT < π/2 (phase −π/2 − ωT reaches −π at ω = π/(2T) where the gain is
        // 2KT/π; common practice). K = 2, T = 1 is beyond: no steady state, no figures, but a trace.
        var response = LoopResponse.Analyse(Delayed([("K", 2.0)], "K/s", 1.0), Values());
        Assert.True(response.IsAvailable);
        Assert.False(response.IsStable);
        Assert.Null(response.SteadyState);
        Assert.Null(response.Figures);
        Assert.Null(response.Estimate);
        Assert.NotNull(response.Trace);
    }

    [Fact]
    public void Controller_and_plant_form_the_delayed_forward_path()
    {
        // C = K, G = 1/(τs + 1), delay T; on [T, 2T] the output is K(1 − e^{−(t−T)/τ}) (the loop is still open there:
        // nothing has come round yet; method of steps, by hand).
        const double k = 0.8, tau = 0.7, delay = 0.4;
        var model = Delayed([("K", k), ("tau", tau)], "1/(tau*s + 1)", delay, controller: "K");
        var trace = LoopResponse.Analyse(model, Values()).Trace!;
        for (int j = 0; j < trace.Count && trace.Times[j] <= 2 * delay; j++)
        {
            double t = trace.Times[j];
            double expected = t <= delay ? 0 : k * (1 - Math.Exp(-(t - delay) / tau));
            Assert.Equal(expected, trace.Outputs[j], 1e-11);
        }

        // Final value K/(1 + K) (final-value theorem; the delay is 1 at s = 0).
        Assert.Equal(k / (1 + k), LoopResponse.Analyse(model, Values()).SteadyState!.Value, 1e-12);
    }

    [Fact]
    public void A_delay_far_below_the_grid_step_uses_the_pade_loop()
    {
        // K = 1, G = 1/(s + 1): without delay y = (1 − e^{−2t})/2 (inverse Laplace transform, common practice); a
        // 1 µs delay moves it by at most about 1e-6.
        var response = LoopResponse.Analyse(Delayed([("K", 1.0)], "K/(s+1)", 1e-6), Values());
        Assert.Equal(ResponseMethod.PadeDelay, response.Method);
        var trace = response.Trace!;
        for (int j = 0; j < trace.Count; j += 25)
        {
            Assert.Equal((1 - Math.Exp(-2 * trace.Times[j])) / 2, trace.Outputs[j], 2e-6);
        }
    }

    [Fact]
    public void Sampled_motor_loop_gives_the_textbook_output_sequence()
    {
        // K = 1, T = 1 s: c(k) = 0, 0.3679, 1.0000, 1.3996, 1.3996, 1.1470, 0.8944, 0.8015, 0.8682, 0.9937, 1.0770
        // (Ogata, Discrete-Time Control Systems, 2nd ed., ch. 4, from memory; also by hand from
        // c(k+2) = c(k+1) − 0.6321c(k) + 0.6321 for k >= 0). Overshoot about 40 % at the 3rd and 4th samples.
        double[] book = [0, 0.3679, 1.0, 1.3996, 1.3996, 1.1470, 0.8944, 0.8015, 0.8682, 0.9937, 1.0770];
        var response = LoopResponse.Analyse(Sampled([("K", 1.0)], "K/(s*(s+1))", 1.0), Values());
        Assert.Equal(ResponseMethod.SampledBetweenSamples, response.Method);
        var trace = response.SampleTrace!;
        for (int k = 0; k < book.Length; k++)
        {
            Assert.Equal(k, trace.Times[k], 1e-12);
            Assert.Equal(book[k], trace.Outputs[k], 1e-4);
        }

        Assert.Equal(1.0, response.SteadyState!.Value, 1e-12);
        Assert.Equal(39.96, response.SampleFigures!.OvershootPct!.Value, 1e-2);
        // c(4) = c(3) − 0.6321·c(2) + 0.6321 = c(3) exactly, since c(2) = 1: rounding picks which is the peak.
        Assert.Contains(response.SampleFigures.PeakTimeSeconds!.Value, new[] { 3.0, 4.0 });
        Assert.Equal(0.2494, response.Estimate!.Damping, 1e-4);
    }

    [Fact]
    public void Sampled_loop_past_its_critical_gain_has_no_figures()
    {
        // Critical gain 2.3922 (Ogata, as above); K = 3 is beyond.
        var response = LoopResponse.Analyse(Sampled([("K", 3.0)], "K/(s*(s+1))", 1.0), Values());
        Assert.False(response.IsStable);
        Assert.Null(response.SteadyState);
        Assert.Null(response.Figures);
        Assert.Null(response.Estimate);
        Assert.True(response.Trace!.Count >= 21);
    }

    [Fact]
    public void Sampled_response_passes_on_the_hold_accuracy_warning()
    {
        var response = LoopResponse.Analyse(Sampled([("K", 1.0)], "K/(s+1)^5", 1e-4), Values());
        Assert.NotNull(response.Warning);
    }

    [Fact]
    public void A_given_characteristic_has_no_response()
    {
        var model = LoopModelTestPlants.Model([("K", 1.0)], plant: null, characteristic: "s^2 + s + K");
        var response = LoopResponse.Analyse(model, Values());
        Assert.False(response.IsAvailable);
        Assert.Equal(ResponseMethod.None, response.Method);
        Assert.Null(response.Trace);
        Assert.Contains("characteristic", response.Failure, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("s^2 + s + K", 1.0, true)] // roots (−1 ± j√3)/2
    [InlineData("s^2 - s + K", 1.0, false)] // roots (1 ± j√3)/2: Routh–Hurwitz, a negative coefficient (common practice)
    [InlineData("s^3 + s^2 + s + K", 0.5, true)] // Routh–Hurwitz for s³ + a₂s² + a₁s + a₀: stable iff a₂a₁ &gt; a₀ (Ogata, 5th ed., §5-6, from memory)
    [InlineData("s^3 + s^2 + s + K", 2.0, false)]
    public void Without_a_response_stability_still_comes_from_the_characteristic_roots(string characteristic, double k, bool stable)
    {
        var model = LoopModelTestPlants.Model([("K", k)], plant: null, characteristic: characteristic);
        var response = LoopResponse.Analyse(model, Values());
        Assert.False(response.IsAvailable);
        Assert.Equal(stable, response.IsStable);
    }

    [Fact]
    public void An_improper_reference_path_has_no_response()
    {
        // G = s, H = 1/s²: G/(1 + GH) = s³/(s² + s), more zeros than poles (by hand).
        var response = LoopResponse.Analyse(Model([("K", 1.0)], "K*s", sensor: "1/s^2"), Values());
        Assert.False(response.IsAvailable);
        Assert.Contains("more zeros than poles", response.Failure, StringComparison.Ordinal);
    }
}
