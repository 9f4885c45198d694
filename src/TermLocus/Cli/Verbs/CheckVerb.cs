using System.CommandLine;
using System.Text.Json;
using TermLocus.App.Reports;
using TermLocus.App.Text;
using TermLocus.Cli.Json;
using TermLocus.Core.Analysis;

namespace TermLocus.Cli.Verbs;

/// <summary><c>termlocus check PATH... [--json] [--set NAME=VALUE]</c>: every plant at its values, across its band, against its specs.</summary>
internal sealed class CheckVerb : IVerb
{
    /// <inheritdoc/>
    public Command Build(CliContext context)
    {
        var paths = new Argument<string[]>("PATH") { Description = "Plant files, or folders of them", Arity = ArgumentArity.OneOrMore };
        var json = CommonOptions.Json();
        var set = CommonOptions.Set();
        var command = new Command("check", "Check each plant at its current values and across its tolerance band against its specs")
        {
            paths, json, set,
        };
        command.SetAction(result => Run(context, result.GetValue(paths) ?? [], result.GetValue(json), result.GetValue(set) ?? []));
        return command;
    }

    private static int Run(CliContext context, string[] paths, bool json, string[] settings)
    {
        var overrides = ValueOverrides.Parse(settings);
        var files = PlantPaths.Expand(paths);
        // Everything is computed before anything is printed, so bad input leaves stdout empty.
        var checks = files.Select(f =>
        {
            var input = PlantInput.Load(f, overrides);
            return (Input: input, Result: LoopCheck.Run(input.Model, input.Values));
        }).ToList();
        if (json)
        {
            context.Out.Write(JsonOutput.Write(w => WriteJson(w, checks)));
        }
        else
        {
            var glyphs = GlyphChoice.For(context);
            for (int i = 0; i < checks.Count; i++)
            {
                if (i > 0)
                {
                    context.Out.WriteLine();
                }

                foreach (var line in CheckReportPresenter.Lines(checks[i].Input.File, checks[i].Input.Plant, checks[i].Result, glyphs))
                {
                    context.Out.WriteLine(line);
                }
            }
        }

        return checks.All(c => c.Result.Passed) ? ExitCodes.Ok : ExitCodes.SpecViolated;
    }

    private static void WriteJson(Utf8JsonWriter w, List<(PlantInput Input, LoopCheckResult Result)> checks)
    {
        w.WriteStartObject();
        w.WriteString("schema", "termlocus.check/1");
        w.WriteStartArray("plants");
        foreach (var (input, result) in checks)
        {
            CheckJson.WritePlant(w, input, result);
        }

        w.WriteEndArray();
        w.WriteEndObject();
    }
}
