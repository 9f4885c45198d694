using System.Text.Json;
using TermLocus.Core.Plants;

namespace TermLocus.Cli.Json;

/// <summary>The <c>termlocus.response/1</c> document.</summary>
internal static class ResponseJson
{
    /// <summary>Writes the whole document; every figure is null when the loop is unstable or has no steady state.</summary>
    public static void Write(Utf8JsonWriter w, PlantInput input, LoopResponse response)
    {
        var f = response.Figures;
        var e = response.Estimate;
        w.WriteStartObject();
        w.WriteString("schema", "termlocus.response/1");
        w.WriteString("file", input.File);
        JsonOutput.Values(w, "values", input.Plant.Parameters.Select(p => KeyValuePair.Create(p.Name, input.Values[p.Name])));
        w.WriteString("plane", response.Plane.IsSampled ? "z" : "s");
        w.WriteBoolean("stable", response.IsStable);
        JsonOutput.Number(w, "steady_state", response.SteadyState);
        JsonOutput.Number(w, "overshoot_pct", f?.OvershootPct);
        JsonOutput.Number(w, "peak_time", f?.PeakTimeSeconds);
        JsonOutput.Number(w, "rise_time", f?.RiseTimeSeconds);
        JsonOutput.Number(w, "settling_time_2pct", f?.SettlingTime2PctSeconds);
        JsonOutput.Number(w, "settling_time_5pct", f?.SettlingTime5PctSeconds);
        w.WritePropertyName("estimates");
        if (e is null)
        {
            w.WriteNullValue();
        }
        else
        {
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

        if (response.Failure is { } failure)
        {
            w.WriteString("failure", failure);
        }

        w.WriteStartArray("samples");
        if (response.Trace is { } trace)
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
        w.WriteEndObject();
    }
}
