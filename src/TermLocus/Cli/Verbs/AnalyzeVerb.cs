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
        var from = new Option<double?>("--from") { Description = "Start of the swept span (default: the file's range)" };
        var to = new Option<double?>("--to") { Description = "End of the swept span" };
        var command = new Command("analyze", "Locus construction facts: asymptotes, break points, angles, crossings, stable ranges, spec boundaries")
        {
            file, json, set, from, to,
        };
        command.SetAction(result =>
        {
            var input = PlantInput.Load(result.GetValue(file)!, ValueOverrides.Parse(result.GetValue(set) ?? []));
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
