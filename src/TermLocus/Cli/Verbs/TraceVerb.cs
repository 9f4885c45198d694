using System.CommandLine;
using System.Globalization;
using TermLocus.Cli.Json;
using TermLocus.Core.Analysis;

namespace TermLocus.Cli.Verbs;

/// <summary><c>termlocus trace FILE [--csv|--json] [--points N] [--from A] [--to B]</c>: the branches as rows.</summary>
internal sealed class TraceVerb : IVerb
{
    /// <inheritdoc/>
    public Command Build(CliContext context)
    {
        var file = CommonOptions.File();
        var csv = new Option<bool>("--csv") { Description = "Comma-separated rows with a header" };
        var json = CommonOptions.Json();
        var points = new Option<int?>("--points") { Description = "Most swept values sampled (default 4000; adaptive below that)" };
        var from = CommonOptions.From();
        var to = CommonOptions.To();
        var set = CommonOptions.Set();
        var command = new Command("trace", "The locus branches as rows: value, branch, re, im") { file, csv, json, points, from, to, set };
        command.SetAction(result =>
        {
            if (result.GetValue(csv) && result.GetValue(json))
            {
                throw new UsageException("--csv and --json exclude each other");
            }

            var options = TraceOptions.Default;
            if (result.GetValue(points) is int n)
            {
                if (n < options.InitialIntervals + 1 || n > 1_000_000)
                {
                    throw new UsageException($"--points must be from {options.InitialIntervals + 1} to 1000000");
                }

                options = options with { MaxValues = n };
            }

            var input = CommonOptions.LoadPlant(result, file, set);
            var study = LocusInput.Study(input, result.GetValue(from), result.GetValue(to), options);
            Write(context, study.Trace, result.GetValue(csv), result.GetValue(json), input);
            return ExitCodes.Ok;
        });
        return command;
    }

    private static void Write(CliContext context, LocusTrace trace, bool csv, bool json, PlantInput input)
    {
        if (json)
        {
            context.Out.Write(JsonOutput.Write(w =>
            {
                w.WriteStartObject();
                w.WriteString("schema", "termlocus.trace/1");
                w.WriteString("file", input.File);
                w.WriteString("sweep", input.Plant.Loop.Sweep);
                w.WriteString("plane", input.Model.Plane.IsSampled ? "z" : "s");
                w.WriteBoolean("complete", trace.Complete);
                w.WriteStartArray("rows");
                foreach (var (value, branch, re, im) in Rows(trace))
                {
                    w.WriteStartArray();
                    JsonOutput.NumberValue(w, value);
                    w.WriteNumberValue(branch);
                    JsonOutput.NumberValue(w, re);
                    JsonOutput.NumberValue(w, im);
                    w.WriteEndArray();
                }

                w.WriteEndArray();
                w.WriteEndObject();
            }));
            return;
        }

        string format = csv ? "{0},{1},{2},{3}" : "{0,24} {1,6} {2,24} {3,24}";
        context.Out.WriteLine(string.Format(CultureInfo.InvariantCulture, format, "value", "branch", "re", "im"));
        foreach (var (value, branch, re, im) in Rows(trace))
        {
            context.Out.WriteLine(string.Format(CultureInfo.InvariantCulture, format,
                value.ToString("R", CultureInfo.InvariantCulture), branch,
                re.ToString("R", CultureInfo.InvariantCulture), im.ToString("R", CultureInfo.InvariantCulture)));
        }
    }

    private static IEnumerable<(double Value, int Branch, double Re, double Im)> Rows(LocusTrace trace) =>
        trace.Branches.SelectMany((b, i) => b.Points.Select(p => (p.Value, i, p.Pole.Real, p.Pole.Imaginary)));
}
