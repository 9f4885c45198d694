using System.Collections.Immutable;
using TermLocus.App.Text;
using TermLocus.App.Workbench;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.App.Reports;

/// <summary>
/// The text report of <c>termlocus design</c>: the span and band searched, the feasible intervals with what limits
/// each end, the intervals as a bar, and the recommended value with its smallest margin from the full band check.
/// </summary>
public static class DesignReportPresenter
{
    /// <summary>Cells of the interval bar (its labels and brackets fit the 100-column width around it).</summary>
    public const int BarCells = 60;

    /// <summary>The report's lines (at most <see cref="CheckReportPresenter.Width"/> columns each).</summary>
    /// <param name="file">The file as the user named it.</param>
    /// <param name="plant">The plant designed.</param>
    /// <param name="result">The design.</param>
    /// <param name="glyphs">Symbols to use.</param>
    public static ImmutableArray<string> Lines(string file, Plant plant, DesignResult result, Glyphs glyphs)
    {
        ArgumentNullException.ThrowIfNull(plant);
        ArgumentNullException.ThrowIfNull(result);
        var lines = ImmutableArray.CreateBuilder<string>();
        string p = SafeText.Visible(result.Sweep);
        string unit = plant.SweptParameter.Unit.Length > 0 ? " " + SafeText.Visible(plant.SweptParameter.Unit) : string.Empty;
        lines.Add(SafeText.Fit($"{SafeText.Visible(file)}  {SafeText.Visible(plant.Title)}", CheckReportPresenter.Width));
        lines.Add($"  sweep: {p} from {Num(result.Span.Low)} to {Num(result.Span.High)}{unit}");
        lines.AddRange(Band(result));
        lines.AddRange(Wrapped("  specs: ", Specs(plant.Specs, glyphs)));
        if (plant.Specs.MaxOvershootPct is not null)
        {
            lines.Add(result.OvershootJudged
                ? "  overshoot: judged on the simulated step response at every band point, as check judges it"
                : "  note: max_overshoot_pct is not judged: the loop gives only its characteristic polynomial, no response");
        }

        AddIntervals(lines, result, p);
        if (result.Recommended is { } r)
        {
            AddRecommendation(lines, result, r, p, unit, glyphs);
        }

        return lines.ToImmutable();
    }

    private static IEnumerable<string> Band(DesignResult result)
    {
        if (result.Box.Axes.IsEmpty)
        {
            yield return "  band: none (no toleranced parameter besides the swept one); intervals judged at nominal";
            yield break;
        }

        yield return SafeText.Fit($"  band: {BandWording.Box(result.Box)}", CheckReportPresenter.Width);
        yield return $"  intervals judged at nominal and the {result.Box.CornerCount} corners of the band; points inside it";
        yield return "  are searched only at the recommended value";
    }

    private static List<string> Specs(Specs specs, Glyphs g)
    {
        var limits = SpecCheck.Limits(specs).ToList();
        if (specs.MaxOvershootPct is double overshoot)
        {
            limits.Add((SpecKind.MaxOvershootPct, overshoot));
        }

        return limits.Count == 0
            ? ["none: the intervals are where the closed loop is stable"]
            : [.. limits.Select(l =>
            {
                string relation = SpecWording.IsMinimum(l.Spec.Key()) ? g.AtLeast : g.AtMost;
                string u = l.Spec.Unit();
                return $"{l.Spec.Key()} {relation} {NumberText.Exact(l.Limit)}{(u.Length > 0 ? " " + u : string.Empty)}";
            })];
    }

    // Items joined by ", " after the heading, continued under the first item when a line would pass the width.
    private static List<string> Wrapped(string heading, List<string> items)
    {
        var lines = new List<string>();
        string line = heading;
        for (int i = 0; i < items.Count; i++)
        {
            string item = items[i] + (i < items.Count - 1 ? "," : string.Empty);
            if (line.Length > heading.Length && line.Length + 1 + item.Length > CheckReportPresenter.Width)
            {
                lines.Add(line);
                line = new string(' ', heading.Length);
            }

            line += (line.Length > heading.Length ? " " : string.Empty) + item;
        }

        lines.Add(SafeText.Fit(line, CheckReportPresenter.Width));
        return lines;
    }

    private static void AddIntervals(ImmutableArray<string>.Builder lines, DesignResult result, string p)
    {
        if (result.Intervals.IsEmpty)
        {
            lines.Add($"  feasible {p}: none; no value in the span meets every spec at every band point checked");
            lines.Add($"  {Num(result.Span.Low)} {DesignBar.Line(result.Span, [], null, BarCells)} {Num(result.Span.High)}");
            return;
        }

        lines.Add($"  feasible {p}: {result.Intervals.Length} interval{(result.Intervals.Length == 1 ? string.Empty : "s")}");
        foreach (var i in result.Intervals)
        {
            string range = $"    {Num(i.From)} .. {Num(i.To)}   width {NumberText.Short(i.Width, 6)}";
            string ends = Ends(i);
            if (range.Length + 3 + ends.Length <= CheckReportPresenter.Width)
            {
                lines.Add($"{range}   {ends}");
            }
            else
            {
                lines.Add(range);
                lines.Add(SafeText.Fit("      " + ends, CheckReportPresenter.Width));
            }
        }

        lines.Add($"  {Num(result.Span.Low)} {DesignBar.Line(result.Span, result.Intervals, result.Recommended?.Value, BarCells)} {Num(result.Span.High)}");
    }

    private static string Ends(FeasibleInterval i)
    {
        string below = i.FromLimitedBy.IsEmpty ? "span start" : string.Join(" and ", i.FromLimitedBy);
        string above = i.ToLimitedBy.IsEmpty ? "span end" : string.Join(" and ", i.ToLimitedBy);
        return $"below: {below}; above: {above}";
    }

    private static void AddRecommendation(ImmutableArray<string>.Builder lines, DesignResult result, DesignRecommendation r,
        string p, string unit, Glyphs g)
    {
        lines.Add($"  recommended: {p} = {NumberText.Exact(r.Value)}{unit} (largest smallest margin in the widest interval)");
        var m = r.SmallestMargin;
        string where = Where(result.Box, m.At) + (m.AtCorner ? string.Empty : " (inside the band)");
        string figure = m.Spec == DesignMargin.StabilityKey
            ? $"slowest decay rate {g.DecayRate} {NumberText.Significant(m.Margin)} 1/s"
            : $"{SafeText.Visible(m.Spec)} {NumberText.Significant(m.Margin)}{UnitOf(m.Spec)} ({Percent(m.RelativeMargin)} of the limit)";
        lines.Add(SafeText.Fit($"    smallest margin across the band: {figure} at {where}", CheckReportPresenter.Width));
        if (result.OvershootJudged && r.Check.Band.FirstOrDefault(b => b.Spec == SpecKind.MaxOvershootPct) is { WorstActual: double pct } o)
        {
            lines.Add(SafeText.Fit($"    largest overshoot across the band: {NumberText.Significant(pct)} % (limit {NumberText.Exact(o.Limit)} %) at {Where(result.Box, o.At)}",
                CheckReportPresenter.Width));
        }
        string check = $"    band check at {p} = {NumberText.Exact(r.Value)} (corners and interior search): ";
        lines.Add(SafeText.Fit(r.Confirmed ? check + $"pass {g.Met}" : check + $"FAIL {g.Violated} " + Misses(result.Box, r.Check),
            CheckReportPresenter.Width));
    }

    // What the full check found that the corners did not: an interior point of the band.
    private static string Misses(ToleranceBox box, LoopCheckResult check)
    {
        if (!check.StableAcrossBand)
        {
            return "unstable" + (check.WorstDecayRate is { } w ? " at " + BandWording.Point(box, w.At.Toleranced) : string.Empty);
        }

        return string.Join("; ", check.Violated.Select(v => $"{v.Key} missed at {Where(box, v.At)}"));
    }

    // The check names the nominal point by no values at all.
    private static string Where(ToleranceBox box, IReadOnlyDictionary<string, double> at) =>
        BandWording.Point(box, at) is { Length: > 0 } point ? point : "nominal";

    private static string UnitOf(string key) =>
        SpecKindText.TryParseKey(key, out var kind) && kind.Unit().Length > 0 ? " " + kind.Unit() : string.Empty;

    private static string Percent(double relative) => NumberText.Significant(100.0 * relative, 3) + " %";

    private static string Num(double value) => NumberText.Short(value, 10);
}
