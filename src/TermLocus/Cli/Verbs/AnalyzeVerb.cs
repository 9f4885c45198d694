using System.CommandLine;
using TermLocus.App.Reports;
using TermLocus.Cli.Json;

namespace TermLocus.Cli.Verbs;

/// <summary><c>termlocus analyze FILE [--json]</c>: locus construction facts for the swept parameter.</summary>
internal sealed class AnalyzeVerb : IVerb
{
    /// <inheritdoc/>
    public Command Build(CliContext context)
    {
        var file = CommonOptions.File();
        var json = CommonOptions.Json();
        var set = CommonOptions.Set();
        var from = CommonOptions.From();
        var to = CommonOptions.To();
        var command = new Command("analyze", "Locus construction facts: asymptotes, break points, angles, crossings, stable ranges, spec boundaries")
        {
            file, json, set, from, to,
        };
        command.SetAction(result =>
        {
            var input = CommonOptions.LoadPlant(result, file, set);
            var study = LocusInput.Study(input, result.GetValue(from), result.GetValue(to));
            if (result.GetValue(json))
            {
                context.Out.Write(JsonOutput.Write(w => AnalyzeJson.Write(w, input, study)));
            }
            else
            {
                foreach (var line in AnalyzeReportPresenter.Lines(input.File, input.Plant, study, GlyphChoice.For(context)))
                {
                    context.Out.WriteLine(line);
                }
            }

            return ExitCodes.Ok;
        });
        return command;
    }
}
