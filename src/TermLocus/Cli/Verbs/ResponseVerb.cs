using System.Collections.Immutable;
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
            var input = CommonOptions.LoadPlant(result, file, set);
            var response = LoopResponse.Analyse(input.Model, input.Values);
            if (!response.IsAvailable)
            {
                // This plant cannot give a step response (only its characteristic polynomial, an improper closed
                // loop): input the verb cannot handle, so one located line on stderr and nothing on stdout.
                throw new PlantFileException(new PlantFileError(input.File, WhereTheLoopIsWritten(input.Plant.Loop),
                    "no step response: " + response.Failure));
            }

            var missed = Missed(input, response);
            if (result.GetValue(json))
            {
                context.Out.Write(JsonOutput.Write(w => ResponseJson.Write(w, input, response, missed)));
            }
            else
            {
                var chosen = SymbolChoice.Detect(context.Environment, result.GetValue(symbols));
                WriteText(context, input, response, chosen);
                var g = chosen == CanvasSymbols.Braille ? Glyphs.Unicode : Glyphs.Ascii;
                context.Out.WriteLine(missed.IsEmpty
                    ? $"  specs at these values: every one met {g.Met}"
                    : $"  specs at these values: {g.Violated} missed {string.Join(", ", missed)}");
            }

            return missed.IsEmpty ? ExitCodes.Ok : ExitCodes.SpecViolated;
        });
        return command;
    }

    // The specs judged at these values (the band is what `check` judges): strict stability, every pole limit at the
    // closed-loop poles here, and max_overshoot_pct on the simulated response. Spec keys, "stable" for stability.
    private static ImmutableArray<string> Missed(PlantInput input, LoopResponse response)
    {
        var missed = ImmutableArray.CreateBuilder<string>();
        if (!response.IsStable)
        {
            missed.Add("stable");
        }

        missed.AddRange(LoopCheck.Run(input.Model, input.Values).Nominal.Violations.Select(v => v.Key).Distinct());
        if (input.Plant.Specs.MaxOvershootPct is double limit && !(response.Figures?.OvershootPct is double o && o <= limit))
        {
            missed.Add(SpecKind.MaxOvershootPct.Key());
        }

        return missed.ToImmutable();
    }

    private static SourcePosition WhereTheLoopIsWritten(LoopDefinition loop) =>
        (loop.Characteristic ?? loop.Plant)?.PositionOf(0) ?? new SourcePosition(1, 1);

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
