using System.Collections.Immutable;
using TermLocus.App.Text;
using TermLocus.App.Workbench;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;
using TermLocus.Core.Time;

namespace TermLocus.App.Reports;

/// <summary>
/// The figures of a closed-loop step response beside the dominant-pair estimates, so a misleading estimate shows. For
/// a sampled loop simulated between samples a third column gives the figures of the sample instants alone, so an
/// overshoot the samples miss shows too.
/// </summary>
public static class ResponseReportPresenter
{
    /// <summary>Figure lines (no plot): steady state, rise, peak, overshoot, settling, each measured (between samples and at
    /// them, for a sampled loop) and estimated.</summary>
    public static ImmutableArray<string> Lines(LoopResponse response, Glyphs g) => Lines(response, g, null);

    /// <summary>
    /// The figure lines, then, when <paramref name="settlingSpec"/> is given (the file sets <c>max_settling_time</c>),
    /// how that spec is judged: as 4/σ of the slowest pole, with that figure, beside the simulated 2 % settling time.
    /// </summary>
    /// <param name="response">The simulated response.</param>
    /// <param name="g">Symbols to use.</param>
    /// <param name="settlingSpec">The <c>max_settling_time</c> outcome on the poles at the same values, or null.</param>
    public static ImmutableArray<string> Lines(LoopResponse response, Glyphs g, SpecOutcome? settlingSpec)
    {
        var lines = ImmutableArray.CreateBuilder<string>();
        lines.AddRange(FigureLines(response, g));
        if (settlingSpec is { Spec: SpecKind.MaxSettlingTime } spec)
        {
            lines.AddRange(SettlingSpecLines(spec, response.Figures?.SettlingTime2PctSeconds, g));
        }

        return lines.ToImmutable();
    }

    // The spec's own figure (4/σ) beside the simulated one, so a pass with a longer simulated settling is not a surprise.
    private static IEnumerable<string> SettlingSpecLines(SpecOutcome spec, double? simulated, Glyphs g)
    {
        string figure = spec.WorstActual is double t ? NumberText.Significant(t) + " s" : "none (a pole does not decay)";
        yield return $"max_settling_time {g.AtMost} {NumberText.Exact(spec.Limit)} s is judged as 4/{g.DecayRate} of the slowest pole: "
            + $"{figure} {(spec.Met ? g.Met : g.Violated)}";
        string sim = simulated is double s ? NumberText.Significant(s) + " s" : "none";
        yield return $"(the simulated 2 % settling time, {sim}, is shown for comparison and not judged)";
    }

    private static ImmutableArray<string> FigureLines(LoopResponse response, Glyphs g)
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

        var e = response.Estimate;
        lines.AddRange(response.Method == ResponseMethod.SampledBetweenSamples ? SampledTable(response) : Table(response));
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

    private static IEnumerable<string> Table(LoopResponse response)
    {
        var f = response.Figures;
        var e = response.Estimate;
        yield return $"{"figure",-22}{"simulated",12}{"2nd-order estimate",20}";
        yield return Row("steady state", response.SteadyState, null);
        yield return Row("overshoot %", f?.OvershootPct, e?.OvershootPct);
        yield return Row("rise time 10-90 % s", f?.RiseTimeSeconds, null);
        yield return Row("peak time s", f?.PeakTimeSeconds, e?.PeakTimeSeconds);
        yield return Row("settling 2 % s", f?.SettlingTime2PctSeconds, e?.SettlingTime2PctSeconds);
        yield return Row("settling 5 % s", f?.SettlingTime5PctSeconds, e?.SettlingTime5PctSeconds);
    }

    // A sampled loop simulated between samples: the plant output's figures beside those of the sample instants alone.
    private static IEnumerable<string> SampledTable(LoopResponse response)
    {
        var f = response.Figures;
        var k = response.SampleFigures;
        var e = response.Estimate;
        yield return $"{"figure",-20}{"simulated",11}{"at samples",12}{"estimate",11}";
        yield return Row("steady state", response.SteadyState, response.SteadyState, null);
        yield return Row("overshoot %", f?.OvershootPct, k?.OvershootPct, e?.OvershootPct);
        yield return Row("rise time 10-90 % s", f?.RiseTimeSeconds, k?.RiseTimeSeconds, null);
        yield return Row("peak time s", f?.PeakTimeSeconds, k?.PeakTimeSeconds, e?.PeakTimeSeconds);
        yield return Row("settling 2 % s", f?.SettlingTime2PctSeconds, k?.SettlingTime2PctSeconds, e?.SettlingTime2PctSeconds);
        yield return Row("settling 5 % s", f?.SettlingTime5PctSeconds, k?.SettlingTime5PctSeconds, e?.SettlingTime5PctSeconds);
        yield return $"simulated between samples, {response.PointsPerSample} points a sample";
    }

    private static string Row(string name, double? simulated, double? estimate) =>
        $"{name,-22}{Show(simulated),12}{Show(estimate),20}";

    private static string Row(string name, double? simulated, double? atSamples, double? estimate) =>
        $"{name,-20}{Show(simulated),11}{Show(atSamples),12}{Show(estimate),11}";

    private static string Show(double? value) => value is double v ? NumberText.Significant(v) : "-";
}
