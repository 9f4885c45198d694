using System.Collections.Immutable;
using TermLocus.App.Canvas;
using TermLocus.App.Plot;
using TermLocus.App.Reports;
using TermLocus.App.Text;
using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>
/// The step-response pane: the closed-loop unit-step response as a dot plot with the ±2 % band and the peak marked
/// (the plot <c>termlocus response</c> draws), and the measured figures beside the dominant-pair estimates: the full
/// table to the right when the pane is wide, a short one below it otherwise. A figure over the file's overshoot limit
/// is marked with the violation glyph. For a sampled loop the curve is the plant output between samples, the sample
/// instants are marked on it when they lie far enough apart (<see cref="ResponsePlot.MarksSamples"/>), and the tables
/// give the figures of the instants alone in a column of their own.
/// </summary>
public static class ResponsePanePresenter
{
    /// <summary>Columns the full figure table (<see cref="ResponseReportPresenter"/>) takes beside the plot.</summary>
    public const int FiguresWidth = 56;

    /// <summary>Narrowest plot worth drawing beside the full figure table.</summary>
    public const int MinimumSidePlotWidth = 40;

    private const int MinimumPlotRows = 4;
    private const int MinimumPlotColumns = 10;

    /// <summary>Exactly <paramref name="height"/> lines of <paramref name="width"/> columns.</summary>
    public static ImmutableArray<string> Lines(PlantSession? session, int width, int height, CanvasSymbols symbols, Glyphs g)
    {
        var lines = session?.Response switch
        {
            null when session is null => ["no plant open"],
            null => ["simulating the step response" + g.Ellipsis],
            { Response: { IsAvailable: true, Trace: not null } response } => Drawn(session, response, width, height, symbols, g),
            { Problem: var problem } => WrapProblem(problem, width),
        };
        return lines.Concat(Enumerable.Repeat(string.Empty, Math.Max(0, height - lines.Count)))
            .Take(Math.Max(0, height))
            .Select(l => TextWidth.PadRight(SafeText.Fit(l, width, g.Ellipsis), width))
            .ToImmutableArray();
    }

    /// <summary>The short figure table: overshoot, peak, settling and rise times, simulated beside estimated.</summary>
    public static ImmutableArray<string> CompactFigures(LoopResponse response, double? overshootLimit, Glyphs g)
    {
        ArgumentNullException.ThrowIfNull(response);
        if (!response.IsStable || response.Figures is not { } f)
        {
            return [$"{g.Violated} unstable: no steady state, no figures"];
        }

        var e = response.Estimate;
        bool over = overshootLimit is double limit && f.OvershootPct is double pct && pct > limit;
        string overshoot = over ? g.Violated + " overshoot %" : "overshoot %";
        if (response.Method == ResponseMethod.SampledBetweenSamples && response.SampleFigures is { } k)
        {
            return
            [
                $"{"figure",-16}{"simulated",10}{"at kT",9}{"estimate",10}",
                Row(overshoot, f.OvershootPct, k.OvershootPct, e?.OvershootPct),
                Row("peak s", f.PeakTimeSeconds, k.PeakTimeSeconds, e?.PeakTimeSeconds),
                Row("settling 2 % s", f.SettlingTime2PctSeconds, k.SettlingTime2PctSeconds, e?.SettlingTime2PctSeconds),
                Row("rise 10-90 % s", f.RiseTimeSeconds, k.RiseTimeSeconds, null),
                Row("steady state", response.SteadyState, response.SteadyState, null),
            ];
        }

        return
        [
            $"{"figure",-16}{"simulated",10}{"estimate",10}",
            Row(overshoot, f.OvershootPct, e?.OvershootPct),
            Row("peak s", f.PeakTimeSeconds, e?.PeakTimeSeconds),
            Row("settling 2 % s", f.SettlingTime2PctSeconds, e?.SettlingTime2PctSeconds),
            Row("rise 10-90 % s", f.RiseTimeSeconds, null),
            Row("steady state", response.SteadyState, null),
        ];
    }

    private static List<string> Drawn(PlantSession session, LoopResponse response, int width, int height, CanvasSymbols symbols, Glyphs g)
    {
        double? limit = session.Loaded.Plant.Specs.MaxOvershootPct;
        bool beside = width - FiguresWidth >= MinimumSidePlotWidth;
        int plotColumns = beside ? width - FiguresWidth : width;
        // Beside the plot, a figure line too long for its column (the estimates' poles) is wrapped, not cut.
        var figures = beside
            ? FullFigures(response, limit, g, plotColumns, symbols)
                .SelectMany(l => TextWidth.Of(l) > FiguresWidth - 2 ? HelpPresenter.Wrap(l, FiguresWidth - 2) : [l]).ToList()
            : CompactFigures(response, limit, g).ToList();
        int plotRows = beside ? height : height - figures.Count;
        var plot = plotRows >= MinimumPlotRows && plotColumns >= MinimumPlotColumns
            ? Plot(response, plotColumns, plotRows, symbols)
            : [];
        if (!beside)
        {
            return [.. plot, .. figures];
        }

        var lines = new List<string>();
        for (int i = 0; i < Math.Max(plot.Count, figures.Count); i++)
        {
            string left = i < plot.Count ? plot[i] : string.Empty;
            string right = i < figures.Count ? figures[i] : string.Empty;
            lines.Add(TextWidth.PadRight(left, plotColumns) + "  " + right);
        }

        return lines;
    }

    private static List<string> Plot(LoopResponse response, int columns, int rows, CanvasSymbols symbols)
    {
        var trace = response.Trace!;
        var samples = response.Method == ResponseMethod.SampledBetweenSamples ? response.SampleTrace : null;
        return [.. ResponsePlot.Render(trace.Times, trace.Outputs, response.SteadyState, response.Figures?.PeakTimeSeconds, columns, rows, symbols, samples)];
    }

    private static List<string> FullFigures(LoopResponse response, double? limit, Glyphs g, int plotColumns, CanvasSymbols symbols)
    {
        var lines = ResponseReportPresenter.Lines(response, g).ToList();
        if (limit is double l && response.Figures?.OvershootPct is double pct && pct > l)
        {
            lines.Add($"{g.Violated} overshoot {NumberText.Against(pct, l)} % is over the limit of {NumberText.Exact(l)} %");
        }

        if (response.Method == ResponseMethod.Sampled)
        {
            lines.Add("figures of the output at the sample instants");
        }

        if (response is { Method: ResponseMethod.SampledBetweenSamples, SampleTrace: { } samples, Trace: { } trace })
        {
            lines.Add(ResponsePlot.MarksSamples(samples, trace.Times, plotColumns)
                ? $"{(symbols == CanvasSymbols.Braille ? '•' : 'o')} on the curve: the sample instants"
                : "the sample instants lie too close to mark");
        }

        return lines;
    }

    private static string Row(string name, double? simulated, double? estimate) =>
        $"{name,-16}{Show(simulated),10}{Show(estimate),10}";

    private static string Row(string name, double? simulated, double? atSamples, double? estimate) =>
        $"{name,-16}{Show(simulated),10}{Show(atSamples),9}{Show(estimate),10}";

    private static string Show(double? value) => value is double v ? NumberText.Significant(v) : "-";

    private static List<string> WrapProblem(string? problem, int width) =>
        [.. HelpPresenter.Wrap("no step response: " + SafeText.Visible(problem ?? "unknown"), Math.Max(1, width))];
}
