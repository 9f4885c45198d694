using System.CommandLine;
using TermLocus.App.Reports;
using TermLocus.Cli.Json;
using TermLocus.Core.Analysis;

namespace TermLocus.Cli.Verbs;

/// <summary>
/// <c>termlocus design FILE [--json] [--set NAME=VALUE] [--from A] [--to B]</c>: the intervals of the swept parameter
/// that meet every spec at every band corner, and a recommended value. Exit 0 when an interval exists and the full
/// band check passes at the recommended value; 1 when there is no interval or that check fails.
/// </summary>
internal sealed class DesignVerb : IVerb
{
    /// <inheritdoc/>
    public Command Build(CliContext context)
    {
        var file = CommonOptions.File();
        var json = CommonOptions.Json();
        var set = CommonOptions.Set();
        var from = CommonOptions.From();
        var to = CommonOptions.To();
        var command = new Command("design", "Intervals of the swept parameter that meet every spec at every band corner, and a recommended value")
        {
            file, json, set, from, to,
        };
        command.SetAction(result =>
        {
            var input = CommonOptions.LoadPlant(result, file, set);
            var design = RobustDesign.Find(input.Model, input.Values, LocusInput.Span(input, result.GetValue(from), result.GetValue(to)));
            if (result.GetValue(json))
            {
                context.Out.Write(JsonOutput.Write(w => DesignJson.Write(w, input, design)));
            }
            else
            {
                foreach (var line in DesignReportPresenter.Lines(input.File, input.Plant, design, GlyphChoice.For(context)))
                {
                    context.Out.WriteLine(line);
                }
            }

            return design.Recommended is { Confirmed: true } ? ExitCodes.Ok : ExitCodes.SpecViolated;
        });
        return command;
    }
}
