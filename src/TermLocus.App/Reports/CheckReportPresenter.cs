using System.Collections.Immutable;
using TermLocus.App.Text;
using TermLocus.App.Workbench;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.App.Reports;

/// <summary>
/// The text report of <c>termlocus check</c> for one plant: the values, the pole table (the workbench's own), each
/// spec at nominal and at its worst point of the tolerance band, and a verdict line that never relies on colour.
/// </summary>
public static class CheckReportPresenter
{
    /// <summary>Report width in columns (the command-line contract caps text at 100).</summary>
    public const int Width = 100;

    // Wide enough for "max_settling_time 4/sigma".
    private const int SpecColumn = 26;

    /// <summary>The report's lines (no trailing newline on each).</summary>
    /// <param name="file">The file as the user named it.</param>
    /// <param name="plant">The plant checked.</param>
    /// <param name="result">The check's result.</param>
    /// <param name="glyphs">Symbols to use.</param>
    public static ImmutableArray<string> Lines(string file, Plant plant, LoopCheckResult result, Glyphs glyphs)
    {
        var lines = ImmutableArray.CreateBuilder<string>();
        lines.Add(SafeText.Fit($"{SafeText.Visible(file)}  {SafeText.Visible(plant.Title)}", Width));
        var swept = plant.SweptParameter;
        double value = result.Values[swept.Name];
        string unit = swept.Unit.Length > 0 ? " " + SafeText.Visible(swept.Unit) : string.Empty;
        lines.Add($"  {SafeText.Visible(swept.Name)} = {NumberText.Exact(value)}{unit} (swept)");
        lines.Add(result.Box.Axes.IsEmpty
            ? "  band: none (no toleranced parameter besides the swept one)"
            : $"  band: {BandWording.Box(result.Box)} ({result.Box.CornerCount} corners and interior search)");
        var snapshot = new PoleSnapshot(value, result.Poles, Misses(result.Nominal));
        foreach (var line in PoleTablePresenter.Lines(snapshot, null, Width - 2, 2 + result.Poles.Length, glyphs))
        {
            lines.Add("  " + line.TrimEnd());
        }

        if (result.InfinitePoles > 0)
        {
            lines.Add($"  {result.InfinitePoles} pole(s) at infinity: the characteristic polynomial drops degree at this value");
        }

        foreach (var hidden in result.HiddenPoles)
        {
            lines.Add($"  note: the pole at {SpecWording.Location(hidden, glyphs)} is cancelled in the loop but is still a closed-loop pole");
        }

        if (result.PolesIllConditioned)
        {
            lines.Add($"  note: these poles are ill-conditioned (a repeated or tightly clustered root): rounding alone can move");
            lines.Add($"  them by {NumberText.Significant(100 * result.PoleSpread!.Value)} % of their size, so their digits and the verdict may be wrong");
        }

        AddSpecTable(lines, result, glyphs);
        lines.Add("  " + Verdict(result, glyphs));
        return lines.ToImmutable();
    }

    /// <summary>One line: pass with the smallest margin, or the worst violation across the band in words and numbers.</summary>
    public static string Verdict(LoopCheckResult result, Glyphs glyphs)
    {
        if (!result.StableAcrossBand)
        {
            string where = result.WorstDecayRate is { } w ? " at " + BandWording.Point(result.Box, w.At.Toleranced) : string.Empty;
            // A slowest decay rate of exactly 0 is a pole on the boundary (an integrator at zero gain), not a growing one.
            string what = result.WorstDecayRate is { Value: 0.0 } ? "only marginally stable (a pole on the stability boundary)" : "unstable";
            return $"verdict: FAIL {glyphs.Violated} the closed loop is {what}{where}";
        }

        var violated = result.Violated;
        if (!violated.IsEmpty)
        {
            var worst = violated[0];
            var miss = new SpecMiss(worst.Key, worst.Limit, worst.WorstActual, worst.WorstMargin, worst.WorstPole);
            string more = violated.Length > 1 ? $" (and {violated.Length - 1} more)" : string.Empty;
            return $"verdict: FAIL {glyphs.Violated} {SpecWording.Violation(miss, glyphs)} (with {BandWording.Point(result.Box, worst.At)}){more}";
        }

        var tightest = result.Band.OrderBy(b => b.WorstRelativeMargin).FirstOrDefault();
        return tightest is null
            ? $"verdict: pass {glyphs.Met} stable; the file sets no specs"
            : $"verdict: pass {glyphs.Met} every spec met across the band; least margin {tightest.Key} "
              + $"{NumberText.Significant(tightest.WorstMargin)}{UnitSuffix(tightest.Spec)} at {BandWording.Point(result.Box, tightest.At)}";
    }

    // The margin is in the limit's own unit (percentage points for overshoot), so it reads as "13.82 s", not a bare number.
    private static string UnitSuffix(SpecKind spec)
    {
        string unit = spec.Unit();
        return unit.Length == 0 ? string.Empty : " " + unit;
    }

    // The nominal column is judged like the band column: pole limits on the poles at the values, the overshoot limit
    // on the step response simulated at them. Each figure carries its own mark.
    private static void AddSpecTable(ImmutableArray<string>.Builder lines, LoopCheckResult result, Glyphs g)
    {
        if (result.Band.IsEmpty)
        {
            return;
        }

        lines.Add($"  {"spec",-SpecColumn}{"limit",10}{"nominal",12}{"worst in band",15}  where");
        foreach (var band in result.Band)
        {
            var (nominal, nominalMet) = NominalOf(result, band.Spec);
            string relation = SpecWording.IsMinimum(band.Key) ? g.AtLeast : g.AtMost;
            lines.Add(SafeText.Fit($"  {Label(band.Spec, g),-SpecColumn}{relation + " " + NumberText.Exact(band.Limit),10}"
                + $"{Figure(nominal),10} {Mark(nominalMet, g)}{Figure(band.WorstActual),13} {Mark(band.Met, g)}  {BandWording.Point(result.Box, band.At)}", Width));
        }

        if (result.Band.Any(b => b.Spec == SpecKind.MaxSettlingTime))
        {
            lines.Add($"  max_settling_time is judged as 4/{g.DecayRate} of the slowest pole, as the plant file defines it;");
            lines.Add("  the simulated 2 % settling time (termlocus response) can differ");
        }

        if (result.Band.Any(b => b.Spec == SpecKind.MaxOvershootPct))
        {
            lines.Add("  max_overshoot_pct is judged on the simulated step response, at nominal and at each band corner");
        }
    }

    // max_settling_time is 4/σ of the slowest pole by the file format's definition; the label says so.
    private static string Label(SpecKind spec, Glyphs g) =>
        spec == SpecKind.MaxSettlingTime ? $"{spec.Key()} 4/{g.DecayRate}" : spec.Key();

    private static string Mark(bool met, Glyphs g) => met ? " " : g.Violated;

    private static (double? Figure, bool Met) NominalOf(LoopCheckResult result, SpecKind spec)
    {
        if (spec == SpecKind.MaxOvershootPct)
        {
            return result.NominalOvershoot is { } o ? (o.WorstActual, o.Met) : (null, true);
        }

        var outcome = result.Nominal.Outcomes.FirstOrDefault(o => o.Spec == spec);
        return outcome is null ? (null, true) : (outcome.WorstActual, outcome.Met);
    }

    private static string Figure(double? value) => value is double v ? NumberText.Significant(v) : "none";

    private static ImmutableArray<SpecMiss> Misses(SpecReport report) =>
        report.Violations.Select(v => new SpecMiss(v.Key, v.Limit, v.Actual, v.Margin, v.Pole))
            .OrderBy(m => m.RelativeMargin).ToImmutableArray();
}
