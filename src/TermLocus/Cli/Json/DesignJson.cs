using System.Text.Json;
using TermLocus.Core.Analysis;

namespace TermLocus.Cli.Json;

/// <summary>The <c>termlocus.design/1</c> document.</summary>
internal static class DesignJson
{
    /// <summary>Writes the whole document.</summary>
    public static void Write(Utf8JsonWriter w, PlantInput input, DesignResult result)
    {
        w.WriteStartObject();
        w.WriteString("schema", "termlocus.design/1");
        w.WriteString("file", input.File);
        w.WriteString("title", input.Plant.Title);
        w.WritePropertyName("sweep");
        w.WriteStartObject();
        w.WriteString("name", result.Sweep);
        JsonOutput.Number(w, "from", result.Span.Low);
        JsonOutput.Number(w, "to", result.Span.High);
        w.WriteEndObject();
        w.WritePropertyName("band");
        w.WriteStartObject();
        foreach (var axis in result.Box.Axes)
        {
            w.WriteStartArray(axis.Name);
            JsonOutput.NumberValue(w, axis.Band.Low);
            JsonOutput.NumberValue(w, axis.Band.High);
            w.WriteEndArray();
        }

        w.WriteEndObject();
        // How many band points the intervals were judged at (nominal and corners); interior points only at the recommendation.
        w.WriteNumber("points_checked", result.PointsChecked);
        // Added within design/1: the limits the intervals honour (stability always besides), overshoot among them
        // when it was judged on the simulated step response.
        Keys(w, "limits_judged", LimitsJudged(input, result));
        Intervals(w, result);
        Recommended(w, result.Recommended);
        w.WriteEndObject();
    }

    private static IEnumerable<string> LimitsJudged(PlantInput input, DesignResult result)
    {
        var keys = SpecCheck.Limits(input.Plant.Specs).Select(l => l.Spec.Key());
        return result.OvershootJudged ? keys.Append(SpecKind.MaxOvershootPct.Key()) : keys;
    }

    private static void Intervals(Utf8JsonWriter w, DesignResult result)
    {
        w.WriteStartArray("intervals");
        foreach (var i in result.Intervals)
        {
            w.WriteStartObject();
            JsonOutput.Number(w, "from", i.From);
            JsonOutput.Number(w, "to", i.To);
            Keys(w, "limited_by", i.LimitedBy);
            Keys(w, "from_limited_by", i.FromLimitedBy);
            Keys(w, "to_limited_by", i.ToLimitedBy);
            w.WriteEndObject();
        }

        w.WriteEndArray();
    }

    private static void Keys(Utf8JsonWriter w, string name, IEnumerable<string> keys)
    {
        w.WriteStartArray(name);
        foreach (var key in keys)
        {
            w.WriteStringValue(key);
        }

        w.WriteEndArray();
    }

    // Added within design/1: the largest overshoot over the band points at the recommended value (null when the check
    // judged none); percent, margin in percentage points.
    private static void Overshoot(Utf8JsonWriter w, BandOutcome? o)
    {
        if (o is null)
        {
            w.WriteNull("overshoot");
            return;
        }

        w.WritePropertyName("overshoot");
        w.WriteStartObject();
        JsonOutput.Number(w, "worst_pct", o.WorstActual);
        JsonOutput.Number(w, "limit_pct", o.Limit);
        JsonOutput.Number(w, "margin", o.WorstMargin);
        JsonOutput.Number(w, "relative_margin", o.WorstRelativeMargin);
        JsonOutput.Values(w, "corner", o.At);
        w.WriteBoolean("at_corner", o.AtCorner);
        w.WriteEndObject();
    }

    private static void Recommended(Utf8JsonWriter w, DesignRecommendation? r)
    {
        if (r is null)
        {
            w.WriteNull("recommended");
            return;
        }

        w.WritePropertyName("recommended");
        w.WriteStartObject();
        JsonOutput.Number(w, "value", r.Value);
        w.WritePropertyName("smallest_margin");
        w.WriteStartObject();
        w.WriteString("spec", r.SmallestMargin.Spec);
        JsonOutput.Number(w, "margin", r.SmallestMargin.Margin);
        JsonOutput.Number(w, "relative_margin", r.SmallestMargin.RelativeMargin);
        JsonOutput.Values(w, "corner", r.SmallestMargin.At);
        w.WriteBoolean("at_corner", r.SmallestMargin.AtCorner);
        w.WriteEndObject();
        Overshoot(w, r.Check.Band.FirstOrDefault(b => b.Spec == SpecKind.MaxOvershootPct));
        w.WriteString("verdict", r.Confirmed ? "pass" : "fail");
        w.WriteEndObject();
    }
}
