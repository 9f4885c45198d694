using System.Text.Json;
using TermLocus.Core.Plants;
using TermLocus.Core.Time;

namespace TermLocus.Cli.Json;

/// <summary>
/// The <c>termlocus.response/1</c> document. For a sampled loop the top-level figures are those of the plant output
/// between samples (when it was simulated, <c>"method": "sampled_between_samples"</c>); <c>samples</c> stays the
/// output at the sample instants, <c>between_samples</c> holds the plant output between them, and
/// <c>at_sample_instants</c> the figures of the instants alone.
/// </summary>
internal static class ResponseJson
{
    /// <summary>Writes the whole document; every figure is null when the loop is unstable or has no steady state.</summary>
    /// <param name="w">The writer.</param>
    /// <param name="input">The plant and its values.</param>
    /// <param name="response">The step response at those values.</param>
    /// <param name="missed">Spec keys missed at these values (<c>stable</c> for stability), written as <c>specs_met</c> and <c>missed</c>.</param>
    public static void Write(Utf8JsonWriter w, PlantInput input, LoopResponse response, IReadOnlyList<string> missed)
    {
        w.WriteStartObject();
        w.WriteString("schema", "termlocus.response/1");
        w.WriteString("file", input.File);
        JsonOutput.Values(w, "values", input.Plant.Parameters.Select(p => KeyValuePair.Create(p.Name, input.Values[p.Name])));
        w.WriteString("plane", response.Plane.IsSampled ? "z" : "s");
        w.WriteString("method", MethodName(response.Method));
        w.WriteBoolean("stable", response.IsStable);
        w.WriteBoolean("specs_met", missed.Count == 0);
        w.WriteStartArray("missed");
        foreach (var key in missed)
        {
            w.WriteStringValue(key);
        }

        w.WriteEndArray();
        JsonOutput.Number(w, "steady_state", response.SteadyState);
        Figures(w, response.Figures);
        Estimates(w, response);
        if (response.Failure is { } failure)
        {
            w.WriteString("failure", failure);
        }

        Series(w, "samples", response.SampleTrace ?? response.Trace);
        if (response.Plane.IsSampled)
        {
            if (response.PointsPerSample is int points)
            {
                w.WriteNumber("points_per_sample", points);
            }
            else
            {
                w.WriteNull("points_per_sample");
            }

            Series(w, "between_samples", response.Method == ResponseMethod.SampledBetweenSamples ? response.Trace : null);
            w.WritePropertyName("at_sample_instants");
            if (response.SampleFigures is { } atSamples)
            {
                w.WriteStartObject();
                Figures(w, atSamples);
                w.WriteEndObject();
            }
            else
            {
                w.WriteNullValue();
            }
        }

        w.WriteEndObject();
    }

    /// <summary>The JSON name of a response method.</summary>
    public static string MethodName(ResponseMethod method) => method switch
    {
        ResponseMethod.Continuous => "continuous",
        ResponseMethod.ExactDelay => "exact_delay",
        ResponseMethod.PadeDelay => "pade_delay",
        ResponseMethod.Sampled => "sampled",
        ResponseMethod.SampledBetweenSamples => "sampled_between_samples",
        _ => "none",
    };

    private static void Figures(Utf8JsonWriter w, StepFigures? f)
    {
        JsonOutput.Number(w, "overshoot_pct", f?.OvershootPct);
        JsonOutput.Number(w, "peak_time", f?.PeakTimeSeconds);
        JsonOutput.Number(w, "rise_time", f?.RiseTimeSeconds);
        JsonOutput.Number(w, "settling_time_2pct", f?.SettlingTime2PctSeconds);
        JsonOutput.Number(w, "settling_time_5pct", f?.SettlingTime5PctSeconds);
    }

    private static void Estimates(Utf8JsonWriter w, LoopResponse response)
    {
        var e = response.Estimate;
        w.WritePropertyName("estimates");
        if (e is null)
        {
            w.WriteNullValue();
            return;
        }

        w.WriteStartObject();
        JsonOutput.Number(w, "overshoot_pct", e.OvershootPct);
        JsonOutput.Number(w, "peak_time", e.PeakTimeSeconds);
        JsonOutput.Number(w, "settling_time_2pct", e.SettlingTime2PctSeconds);
        JsonOutput.Number(w, "settling_time_5pct", e.SettlingTime5PctSeconds);
        w.WriteStartArray("from_poles");
        foreach (var p in e.Poles)
        {
            JsonOutput.ComplexValue(w, p);
        }

        w.WriteEndArray();
        w.WriteEndObject();
    }

    private static void Series(Utf8JsonWriter w, string name, ResponseTrace? trace)
    {
        w.WriteStartArray(name);
        if (trace is not null)
        {
            for (int i = 0; i < trace.Times.Length; i++)
            {
                w.WriteStartArray();
                JsonOutput.NumberValue(w, trace.Times[i]);
                JsonOutput.NumberValue(w, trace.Outputs[i]);
                w.WriteEndArray();
            }
        }

        w.WriteEndArray();
    }
}
