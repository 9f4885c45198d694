using System.Numerics;
using System.Text.Json;
using TermLocus.Core.Analysis;

namespace TermLocus.Cli.Json;

/// <summary>The <c>termlocus.analyze/1</c> document.</summary>
internal static class AnalyzeJson
{
    /// <summary>Writes the whole document.</summary>
    public static void Write(Utf8JsonWriter w, PlantInput input, LocusStudy study)
    {
        var facts = study.Facts;
        w.WriteStartObject();
        w.WriteString("schema", "termlocus.analyze/1");
        w.WriteString("file", input.File);
        w.WritePropertyName("sweep");
        w.WriteStartObject();
        w.WriteString("name", input.Plant.Loop.Sweep);
        JsonOutput.Number(w, "from", study.Span.Low);
        JsonOutput.Number(w, "to", study.Span.High);
        w.WriteEndObject();
        w.WriteBoolean("affine", facts.IsAffine);
        w.WriteString("plane", study.Plane.IsSampled ? "z" : "s");
        JsonOutput.Number(w, "sample_time", study.Plane.SampleTimeSeconds);
        w.WritePropertyName("open_loop");
        w.WriteStartObject();
        Points(w, "poles", facts.OpenLoopPoles);
        Points(w, "zeros", facts.OpenLoopZeros);
        w.WriteEndObject();
        Asymptotes(w, facts);
        BreakPoints(w, facts);
        Crossings(w, study);
        Angles(w, "departure_angles", facts.DepartureAngles);
        Angles(w, "arrival_angles", facts.ArrivalAngles);
        w.WriteStartArray("stable_intervals");
        foreach (var i in facts.StableIntervals)
        {
            w.WriteStartObject();
            JsonOutput.Number(w, "from", i.From);
            JsonOutput.Number(w, "to", i.To);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        SpecBoundaries(w, input, study);
        w.WriteEndObject();
    }

    private static void Points(Utf8JsonWriter w, string name, IEnumerable<Complex> points)
    {
        w.WriteStartArray(name);
        foreach (var p in points)
        {
            JsonOutput.ComplexValue(w, p);
        }

        w.WriteEndArray();
    }

    private static void Asymptotes(Utf8JsonWriter w, LocusFacts facts)
    {
        var main = facts.Asymptotes.FirstOrDefault(a => a.Sign == LocusGainSign.Positive) ?? facts.Asymptotes.FirstOrDefault();
        if (!facts.IsAffine || main is null)
        {
            w.WriteNull("asymptotes");
        }
        else
        {
            w.WritePropertyName("asymptotes");
            Asymptote(w, main);
        }

        // Every set, with the sign of the swept value it applies to (an additive field).
        w.WriteStartArray("asymptote_sets");
        foreach (var set in facts.Asymptotes)
        {
            Asymptote(w, set);
        }

        w.WriteEndArray();
    }

    private static void Asymptote(Utf8JsonWriter w, AsymptoteSet set)
    {
        w.WriteStartObject();
        w.WriteString("sign", set.Sign == LocusGainSign.Positive ? "positive" : "negative");
        JsonOutput.Number(w, "centroid", set.Centroid);
        w.WriteStartArray("angles_deg");
        foreach (var a in set.AnglesDegrees)
        {
            JsonOutput.NumberValue(w, a);
        }

        w.WriteEndArray();
        w.WriteEndObject();
    }

    private static void BreakPoints(Utf8JsonWriter w, LocusFacts facts)
    {
        w.WriteStartArray("break_points");
        foreach (var b in facts.BreakPoints)
        {
            w.WriteStartObject();
            JsonOutput.Number(w, "re", b.Location.Real);
            JsonOutput.Number(w, "im", b.Location.Imaginary);
            JsonOutput.Number(w, "value", b.Value);
            w.WriteString("kind", b.Kind == BreakPointKind.Breakaway ? "breakaway" : "break-in");
            w.WriteEndObject();
        }

        w.WriteEndArray();
    }

    private static void Crossings(Utf8JsonWriter w, LocusStudy study)
    {
        w.WriteStartArray("axis_crossings");
        foreach (var c in study.Facts.AxisCrossings)
        {
            w.WriteStartObject();
            JsonOutput.Number(w, "omega", c.Omega);
            JsonOutput.Number(w, "value", c.Value);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteStartArray("unit_circle_crossings");
        foreach (var c in study.UnitCircleCrossings)
        {
            w.WriteStartObject();
            JsonOutput.Number(w, "angle_rad", c.AngleRadians);
            JsonOutput.Number(w, "omega", c.EquivalentFrequency);
            JsonOutput.Number(w, "value", c.Value);
            w.WriteEndObject();
        }

        w.WriteEndArray();
    }

    private static void Angles(Utf8JsonWriter w, string name, IEnumerable<AngleConditionDirection> angles)
    {
        w.WriteStartArray(name);
        foreach (var a in angles)
        {
            w.WriteStartObject();
            JsonOutput.Number(w, "re", a.At.Real);
            JsonOutput.Number(w, "im", a.At.Imaginary);
            JsonOutput.Number(w, "angle_deg", a.AngleDegrees);
            w.WriteString("sign", a.Sign == LocusGainSign.Positive ? "positive" : "negative");
            w.WriteEndObject();
        }

        w.WriteEndArray();
    }

    private static void SpecBoundaries(Utf8JsonWriter w, PlantInput input, LocusStudy study)
    {
        w.WriteStartArray("spec_boundaries");
        foreach (var s in study.SpecBoundaries)
        {
            w.WriteStartObject();
            w.WriteString("spec", s.Spec.Key(input.Plant.Specs));
            JsonOutput.Number(w, "limit", s.Limit);
            JsonOutput.Number(w, "value", s.Value);
            Points(w, "poles", s.Poles);
            w.WriteEndObject();
        }

        w.WriteEndArray();
    }
}
