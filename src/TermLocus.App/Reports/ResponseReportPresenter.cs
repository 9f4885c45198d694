using System.Collections.Immutable;
using TermLocus.App.Text;
using TermLocus.App.Workbench;
using TermLocus.Core.Plants;
using TermLocus.Core.Time;

namespace TermLocus.App.Reports;

/// <summary>The figures of a closed-loop step response beside the dominant-pair estimates, so a misleading estimate shows.</summary>
public static class ResponseReportPresenter
{
    /// <summary>Figure lines (no plot): steady state, rise, peak, overshoot, settling, each measured and estimated.</summary>
    public static ImmutableArray<string> Lines(LoopResponse response, Glyphs g)
    {
        ArgumentNullException.ThrowIfNull(response);
        var lines = ImmutableArray.CreateBuilder<string>();
        if (!response.IsAvailable)
        {
            lines.Add("no step response: " + SafeText.Visible(response.Failure));
            return lines.ToImmutable();
        }

        if (!response.IsStable)
        {
            lines.Add($"the closed loop is unstable {g.Violated}: no steady state, and no figures");
        }

        var f = response.Figures;
        var e = response.Estimate;
        lines.Add($"{"figure",-22}{"simulated",12}{"2nd-order estimate",20}");
        lines.Add(Row("steady state", response.SteadyState, null));
        lines.Add(Row("overshoot %", f?.OvershootPct, e?.OvershootPct));
        lines.Add(Row("rise time 10-90 % s", f?.RiseTimeSeconds, null));
        lines.Add(Row("peak time s", f?.PeakTimeSeconds, e?.PeakTimeSeconds));
        lines.Add(Row("settling 2 % s", f?.SettlingTime2PctSeconds, e?.SettlingTime2PctSeconds));
        lines.Add(Row("settling 5 % s", f?.SettlingTime5PctSeconds, e?.SettlingTime5PctSeconds));
        if (e is not null)
        {
            lines.Add($"estimates from the dominant pole(s) {string.Join(", ", e.Poles.Where(p => p.Imaginary >= 0).Select(p => SpecWording.Location(p, g)))}"
                + $" ({g.Zeta} {NumberText.Significant(e.Damping)}, {g.NaturalFrequency} {NumberText.Significant(e.NaturalFrequency)} rad/s)");
        }

        if (response.Warning is { } warning)
        {
            lines.Add("caution: " + SafeText.Visible(warning));
        }

        return lines.ToImmutable();
    }

    private static string Row(string name, double? simulated, double? estimate) =>
        $"{name,-22}{Show(simulated),12}{Show(estimate),20}";

    private static string Show(double? value) => value is double v ? NumberText.Significant(v) : "-";
}
