using System.Text.Json;
using TermLocus.Core.Analysis;

namespace TermLocus.Cli.Json;

/// <summary>One plant's entry of the <c>termlocus.check/1</c> document.</summary>
internal static class CheckJson
{
    /// <summary>Writes the plant object.</summary>
    public static void WritePlant(Utf8JsonWriter w, PlantInput input, LoopCheckResult result)
    {
        w.WriteStartObject();
        w.WriteString("file", input.File);
        w.WriteString("title", input.Plant.Title);
        JsonOutput.Values(w, "values", input.Plant.Parameters.Select(p => KeyValuePair.Create(p.Name, result.Values[p.Name])));
        w.WriteString("sweep", input.Plant.Loop.Sweep);
        w.WriteString("verdict", result.Passed ? "pass" : "fail");
        w.WriteBoolean("stable", result.StableAcrossBand);
        w.WriteStartArray("poles");
        foreach (var pole in result.Poles)
        {
            WritePole(w, PoleMetrics.Of(pole));
        }

        w.WriteEndArray();
        w.WriteNumber("infinite_poles", result.InfinitePoles);
        w.WriteStartArray("hidden_poles");
        foreach (var hidden in result.HiddenPoles)
        {
            JsonOutput.ComplexValue(w, hidden);
        }

        w.WriteEndArray();
        // Additive within termlocus.check/1: relative movement rounding alone can cause (null when unknown).
        JsonOutput.Number(w, "pole_spread", result.PoleSpread);
        w.WriteBoolean("poles_ill_conditioned", result.PolesIllConditioned);
        WriteWorst(w, result);
        WriteViolations(w, result);
        WriteSpecs(w, result);
        w.WriteEndObject();
    }

    // Additive within termlocus.check/1: every limit with its nominal figure and its worst over the band, and what it
    // is judged on (the overshoot on the simulated step response; the others, max_settling_time as 4/sigma included,
    // on the closed-loop poles).
    private static void WriteSpecs(Utf8JsonWriter w, LoopCheckResult result)
    {
        w.WriteStartArray("specs");
        foreach (var band in result.Band)
        {
            bool overshoot = band.Spec == SpecKind.MaxOvershootPct;
            var (nominal, nominalMet) = overshoot
                ? (result.NominalOvershoot?.WorstActual, result.NominalOvershoot?.Met ?? true)
                : result.Nominal.Outcomes.FirstOrDefault(o => o.Spec == band.Spec) is { } o ? (o.WorstActual, o.Met) : (null, true);
            w.WriteStartObject();
            w.WriteString("spec", band.Key);
            w.WriteString("judged_on", overshoot ? "step_response" : band.Spec == SpecKind.MaxSettlingTime ? "poles_4_over_sigma" : "poles");
            JsonOutput.Number(w, "limit", band.Limit);
            JsonOutput.Number(w, "nominal", nominal);
            w.WriteBoolean("nominal_met", nominalMet);
            JsonOutput.Number(w, "worst", band.WorstActual);
            JsonOutput.Number(w, "worst_margin", band.WorstMargin);
            w.WriteBoolean("met", band.Met);
            JsonOutput.Values(w, "corner", band.At);
            w.WriteEndObject();
        }

        w.WriteEndArray();
    }

    private static void WritePole(Utf8JsonWriter w, PoleMetrics m)
    {
        w.WriteStartObject();
        JsonOutput.Number(w, "re", m.Pole.Real);
        JsonOutput.Number(w, "im", m.Pole.Imaginary);
        JsonOutput.Number(w, "damping", m.Damping);
        JsonOutput.Number(w, "natural_frequency", m.NaturalFrequency);
        JsonOutput.Number(w, "decay_rate", m.DecayRate);
        JsonOutput.Number(w, "time_to_half", m.TimeToHalfSeconds);
        w.WriteEndObject();
    }

    private static void WriteWorst(Utf8JsonWriter w, LoopCheckResult result)
    {
        w.WritePropertyName("worst");
        w.WriteStartObject();
        JsonOutput.Number(w, "damping", result.WorstDamping?.Value);
        JsonOutput.Number(w, "decay_rate", result.WorstDecayRate?.Value);
        // "corner" is where the damping is worst; the decay rate's own point follows (an additive field).
        JsonOutput.Values(w, "corner", result.WorstDamping?.At.Toleranced ?? []);
        JsonOutput.Values(w, "decay_rate_corner", result.WorstDecayRate?.At.Toleranced ?? []);
        w.WriteEndObject();
    }

    private static void WriteViolations(Utf8JsonWriter w, LoopCheckResult result)
    {
        w.WriteStartArray("violations");
        foreach (var band in result.Violated)
        {
            w.WriteStartObject();
            w.WriteString("spec", band.Key);
            JsonOutput.Number(w, "limit", band.Limit);
            JsonOutput.Number(w, "actual", band.WorstActual);
            JsonOutput.Number(w, "margin", band.WorstMargin);
            JsonOutput.Complex(w, "pole", band.WorstPole);
            JsonOutput.Values(w, "corner", band.At);
            w.WriteEndObject();
        }

        w.WriteEndArray();
    }
}
