using System.CommandLine;
using TermLocus.App.Canvas;
using TermLocus.App.Plot;
using TermLocus.App.Reports;
using TermLocus.App.Text;
using TermLocus.Cli.Json;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;
using TermLocus.Core.Time;

namespace TermLocus.Cli.Verbs;

/// <summary><c>termlocus response FILE [--json]</c>: closed-loop step response figures (and a plot in text mode).</summary>
internal sealed class ResponseVerb : IVerb
{
    private const int PlotColumns = 80;

    /// <inheritdoc/>
    public Command Build(CliContext context)
    {
        var file = CommonOptions.File();
        var json = CommonOptions.Json();
        var set = CommonOptions.Set();
        var symbols = CommonOptions.Symbols();
        var command = new Command("response", "Closed-loop step response: rise, peak, overshoot and settling, with second-order estimates")
        {
            file, json, set, symbols,
        };
        command.SetAction(result =>
        {
            var input = PlantInput.Load(result.GetValue(file)!, ValueOverrides.Parse(result.GetValue(set) ?? []));
            var response = LoopResponse.Analyse(input.Model, input.Values);
            if (result.GetValue(json))
            {
                context.Out.Write(JsonOutput.Write(w => ResponseJson.Write(w, input, response)));
            }
            else
            {
                WriteText(context, input, response, SymbolChoice.Detect(context.Environment, result.GetValue(symbols)));
            }

            if (!response.IsAvailable)
            {
                return ExitCodes.BadInput;
            }

            double? limit = input.Plant.Specs.MaxOvershootPct;
            bool overshootMet = limit is not double l || response.Figures?.OvershootPct is double o && o <= l;
            return response.IsStable && overshootMet ? ExitCodes.Ok : ExitCodes.SpecViolated;
        });
        return command;
    }

    // What the plotted curve is: for a sampled loop the plant output between samples (instants marked when they lie
    // far enough apart), or the output at the instants alone.
    private static string Caption(LoopResponse response, ResponseTrace? samples, CanvasSymbols symbols)
    {
        if (!response.Plane.IsSampled)
        {
            return string.Empty;
        }

        if (samples is null || response.Trace is not { } trace)
        {
            return " (output at the sample instants)";
        }

        return ResponsePlot.MarksSamples(samples, trace.Times, PlotColumns)
            ? $" (plant output between samples, {(symbols == CanvasSymbols.Braille ? '•' : 'o')} at the sample instants)"
            : " (plant output between samples; the instants lie too close to mark)";
    }

    private static void WriteText(CliContext context, PlantInput input, LoopResponse response, CanvasSymbols symbols)
    {
        var glyphs = symbols == CanvasSymbols.Braille ? Glyphs.Unicode : Glyphs.Ascii;
        string sweep = input.Plant.Loop.Sweep;
        context.Out.WriteLine(SafeText.Fit($"{SafeText.Visible(input.File)}  {SafeText.Visible(input.Plant.Title)}", CheckReportPresenter.Width));
        var samples = response.Method == ResponseMethod.SampledBetweenSamples ? response.SampleTrace : null;
        context.Out.WriteLine($"  step response at {SafeText.Visible(sweep)} = {NumberText.Exact(input.Values[sweep])}"
            + Caption(response, samples, symbols));
        if (response.Trace is { } trace && response.IsAvailable)
        {
            foreach (var line in ResponsePlot.Render(trace.Times, trace.Outputs, response.SteadyState, response.Figures?.PeakTimeSeconds, PlotColumns, 14, symbols, samples))
            {
                context.Out.WriteLine("  " + line.TrimEnd());
            }
        }

        var settlingSpec = input.Plant.Specs.MaxSettlingTimeSeconds is null || !response.IsAvailable ? null
            : LoopCheck.PoleSpecs(input.Model, input.Values).Outcomes.FirstOrDefault(o => o.Spec == SpecKind.MaxSettlingTime);
        foreach (var line in ResponseReportPresenter.Lines(response, glyphs, settlingSpec))
        {
            context.Out.WriteLine("  " + line);
        }
    }
}
