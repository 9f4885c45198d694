using System.Collections.Immutable;
using TermLocus.App.Text;
using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>
/// The parameter panel: the plant's title, the swept parameter with its value and unit, the step (and the band step),
/// whether the value is saved and whether the file changed on disk, where it stands in its range as a small bar, the
/// varied parameter and its band, then (given room) the file, the specs and the note.
/// Short lines, most important first, so a narrow side panel shows what matters.
/// </summary>
public static class ParameterPanelPresenter
{
    /// <summary>At most <paramref name="height"/> lines of exactly <paramref name="width"/> columns.</summary>
    public static ImmutableArray<string> Lines(PlantSession? session, int width, int height, Glyphs glyphs)
    {
        var lines = new List<string>();
        if (session is null)
        {
            lines.Add("no plant open");
            lines.Add("o opens the library");
            lines.Add("? shows the keys");
        }
        else
        {
            var plant = session.Loaded.Plant;
            var sweep = session.Sweep;
            lines.Add(plant.Title.Length > 0 ? SafeText.Visible(plant.Title) : SafeText.Visible(Path.GetFileName(plant.Path)));
            lines.Add(ValueLine(sweep));
            string step = "step " + NumberText.Exact(sweep.Step);
            string? bandStep = session.Varied.Parameter is null ? null : BandStepLine(session.Varied);
            // The band step shares the step line when it fits (a short panel keeps its specs); else it gets its own.
            string? shared = bandStep is null ? null
                : new[] { $"{step}   {bandStep}", $"{step}   band step 1/{session.Varied.Divisions}" }.FirstOrDefault(l => TextWidth.Of(l) <= width);
            lines.Add(shared ?? step);
            lines.Add(sweep.Unsaved ? $"{glyphs.Violated} unsaved (file: {NumberText.Exact(sweep.SavedValue)})" : "saved in the file");
            if (DiskLine(session.Disk, glyphs) is { } disk)
            {
                lines.Add(disk);
            }

            lines.Add(Bar(sweep, width, glyphs));
            if (session.Varied.Parameter is not null)
            {
                lines.Add(VariedLine(session.Varied));
                lines.Add(BandBar(session.Varied, width, glyphs));
                if (shared is null)
                {
                    lines.Add(bandStep!);
                }
            }

            lines.Add("file: " + SafeText.Visible(Path.GetFileName(plant.Path)));
            lines.AddRange(SpecLines(plant.Specs, width, glyphs));
            if (plant.Note.Length > 0)
            {
                lines.AddRange(HelpPresenter.Wrap(SafeText.Visible(plant.Note), Math.Max(1, width)));
            }
        }

        return lines.Take(Math.Max(0, height))
            .Select(l => TextWidth.PadRight(SafeText.Fit(l, width, glyphs.Ellipsis), width))
            .ToImmutableArray();
    }

    /// <summary>"Kc = 1.2 A/(rad/s)".</summary>
    public static string ValueLine(SweepState sweep)
    {
        string unit = sweep.Unit.Length > 0 ? " " + SafeText.Visible(sweep.Unit) : string.Empty;
        return $"{sweep.Name} = {NumberText.Exact(sweep.Value)}{unit}";
    }

    /// <summary>"0 ───●······· 20": the range ends and the value's place between them.</summary>
    public static string Bar(SweepState sweep, int width, Glyphs glyphs) =>
        Bar(NumberText.Exact(sweep.Range.Low), NumberText.Exact(sweep.Range.High), sweep.Position, width, glyphs);

    /// <summary>"J = 0.485 kg*m^2 (+15.5 %)", or "(nominal)": the varied parameter and its offset.</summary>
    public static string VariedLine(VariedPosition varied)
    {
        string unit = varied.Unit.Length > 0 ? " " + SafeText.Visible(varied.Unit) : string.Empty;
        string offset = varied.IsNominal ? "nominal"
            : varied.PercentFromNominal is double pct ? StatusLinePresenter.Signed(pct) + " %"
            : "nominal " + NumberText.Short(varied.Nominal, 6);
        return $"{varied.Parameter} = {NumberText.Short(varied.Value, 6)}{unit} ({offset})";
    }

    /// <summary>"! file changed on disk", "! file gone from disk", or null while the file is as loaded.</summary>
    public static string? DiskLine(FileOnDisk disk, Glyphs glyphs) => disk switch
    {
        FileOnDisk.Changed => glyphs.Violated + " file changed on disk",
        FileOnDisk.Missing => glyphs.Violated + " file gone from disk",
        _ => null,
    };

    /// <summary>"band step 1/10 = 0.08": how far ↑/↓ move the varied parameter.</summary>
    public static string BandStepLine(VariedPosition varied) =>
        $"band step 1/{varied.Divisions} = {NumberText.Short(varied.Step, 4)}";

    /// <summary>"0.3 ──●──── 0.65": the band's ends and the varied value's place between them.</summary>
    public static string BandBar(VariedPosition varied, int width, Glyphs glyphs) =>
        Bar(NumberText.Short(varied.Band.Low, 6), NumberText.Short(varied.Band.High, 6), varied.Position, width, glyphs);

    // Band ends from tolerance_pct carry binary dust (0.8 × 0.75 = 0.6000000000000001): six digits say enough.
    private static string Bar(string low, string high, double position, int width, Glyphs glyphs)
    {
        int barWidth = Math.Min(width - low.Length - high.Length - 2, 40);
        if (barWidth < 3)
        {
            return $"{low}..{high}";
        }

        int at = (int)Math.Round(position * (barWidth - 1));
        string bar = string.Concat(Enumerable.Repeat(glyphs.BarFilled, at)) + glyphs.BarMarker
            + string.Concat(Enumerable.Repeat(glyphs.BarEmpty, barWidth - at - 1));
        return $"{low} {bar} {high}";
    }

    /// <summary>"specs: ζ ≥ 0.6  t½ ≤ 0.05 s" on one line when it fits, else one spec a line.</summary>
    public static IEnumerable<string> SpecLines(Specs specs, int width, Glyphs g)
    {
        var parts = SpecParts(specs, g);
        if (parts.Count == 0)
        {
            return ["specs: none"];
        }

        string one = "specs: " + string.Join("  ", parts);
        return TextWidth.Of(one) <= width ? [one] : ["specs:", .. parts.Select(p => "  " + p)];
    }

    /// <summary>Each limit of <paramref name="specs"/> as "ζ ≥ 0.6", "t½ ≤ 0.05 s", in a fixed order.</summary>
    public static List<string> SpecParts(Specs specs, Glyphs g)
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
        return parts;
    }
}
