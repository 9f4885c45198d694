using System.Collections.Immutable;
using TermLocus.App.Text;
using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>
/// The parameter panel: the plant's title, the swept parameter with its value, unit and step, whether the value is
/// saved, where it stands in its range as a small bar, then (given room) the file, the specs and the note.
/// </summary>
public static class ParameterPanelPresenter
{
    /// <summary>At most <paramref name="height"/> lines of exactly <paramref name="width"/> columns, most important first.</summary>
    public static ImmutableArray<string> Lines(PlantSession? session, int width, int height, Glyphs glyphs)
    {
        var lines = new List<string>();
        if (session is null)
        {
            lines.Add("no plant open");
            lines.Add("o opens the library, ? shows the keys");
        }
        else
        {
            var plant = session.Loaded.Plant;
            var sweep = session.Sweep;
            lines.Add(SafeText.Fit(plant.Title.Length > 0 ? plant.Title : Path.GetFileName(plant.Path), width, glyphs.Ellipsis));
            lines.Add(ValueLine(sweep, glyphs));
            lines.Add(Bar(sweep, width, glyphs));
            lines.Add("file: " + SafeText.Visible(Path.GetFileName(plant.Path)));
            lines.Add("specs: " + SpecsSummary(plant.Specs, glyphs));
            if (plant.Note.Length > 0)
            {
                lines.Add(SafeText.Visible(plant.Note));
            }
        }

        return lines.Take(Math.Max(0, height)).Select(l => TextWidth.PadRight(l, width)).ToImmutableArray();
    }

    /// <summary>"Kc = 1.2 A/(rad/s)  step 0.1  unsaved (file 0.8)".</summary>
    public static string ValueLine(SweepState sweep, Glyphs glyphs)
    {
        _ = glyphs;
        string unit = sweep.Unit.Length > 0 ? " " + SafeText.Visible(sweep.Unit) : string.Empty;
        string saved = sweep.Unsaved ? $"  * unsaved (file {NumberText.Exact(sweep.SavedValue)})" : "  saved";
        return $"{sweep.Name} = {NumberText.Exact(sweep.Value)}{unit}  step {NumberText.Exact(sweep.Step)}{saved}";
    }

    /// <summary>"0 ───●······· 20": the range ends and the value's place between them.</summary>
    public static string Bar(SweepState sweep, int width, Glyphs glyphs)
    {
        string low = NumberText.Exact(sweep.Range.Low);
        string high = NumberText.Exact(sweep.Range.High);
        int barWidth = width - low.Length - high.Length - 2;
        if (barWidth < 3)
        {
            return $"{low}..{high}";
        }

        int at = (int)Math.Round(sweep.Position * (barWidth - 1));
        string bar = string.Concat(Enumerable.Repeat(glyphs.BarFilled, at)) + glyphs.BarMarker
            + string.Concat(Enumerable.Repeat(glyphs.BarEmpty, barWidth - at - 1));
        return $"{low} {bar} {high}";
    }

    /// <summary>"ζ ≥ 0.6  t½ ≤ 0.05 s  ωn ≤ 400 rad/s", or "none".</summary>
    public static string SpecsSummary(Specs specs, Glyphs g)
    {
        var parts = new List<string>();
        void Add(double? limit, string figure, string relation, string unit)
        {
            if (limit is double v)
            {
                parts.Add($"{figure} {relation} {NumberText.Exact(v)}{unit}");
            }
        }

        Add(specs.MinDamping, g.Zeta, g.AtLeast, string.Empty);
        Add(specs.MinDecayRate, g.DecayRate, g.AtLeast, " 1/s");
        Add(specs.MaxTimeToHalfSeconds, g.TimeToHalf, g.AtMost, " s");
        Add(specs.MaxSettlingTimeSeconds, "settling", g.AtMost, " s");
        Add(specs.MinNaturalFrequency, g.NaturalFrequency, g.AtLeast, " rad/s");
        Add(specs.MaxNaturalFrequency, g.NaturalFrequency, g.AtMost, " rad/s");
        Add(specs.MaxOvershootPct, "overshoot", g.AtMost, " %");
        return parts.Count == 0 ? "none" : string.Join("  ", parts);
    }
}
