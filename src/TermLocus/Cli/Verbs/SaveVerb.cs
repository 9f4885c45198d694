using System.CommandLine;
using TermLocus.App.Reports;
using TermLocus.App.Text;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Cli.Verbs;

/// <summary>
/// <c>termlocus save FILE [--set SWEPT=VALUE] [--name TEXT] [--note TEXT]</c>: records an operating point in the
/// plant file the same way the workbench does: the swept value in place and one appended record, written atomically.
/// </summary>
internal sealed class SaveVerb : IVerb
{
    /// <inheritdoc/>
    public Command Build(CliContext context)
    {
        var file = CommonOptions.File();
        var set = CommonOptions.Set();
        var name = new Option<string>("--name") { Description = "Name of the operating point (default: NAME = VALUE)" };
        var note = new Option<string>("--note") { Description = "Free text stored with the point" };
        var command = new Command("save", "Write the swept value and an operating-point record (with its verdict) into the plant file")
        {
            file, set, name, note,
        };
        command.SetAction(result => Run(context, result.GetValue(file)!, result.GetValue(set) ?? [], result.GetValue(name), result.GetValue(note)));
        return command;
    }

    private static int Run(CliContext context, string file, string[] settings, string? name, string? note)
    {
        var overrides = ValueOverrides.Parse(settings);
        var input = PlantInput.Load(file, overrides);
        string swept = input.Plant.Loop.Sweep;
        foreach (var key in overrides.Keys.Where(k => k != swept))
        {
            throw new UsageException($"save changes only the swept parameter '{swept}'; --set {key} would not be recorded");
        }

        double value = input.Values[swept];
        var check = LoopCheck.Run(input.Model, input.Values);
        string verdict = CheckReportPresenter.Verdict(check, Glyphs.Ascii)["verdict: ".Length..];
        var document = input.Document;
        var record = new OperatingPointRecord(
            name ?? $"{swept} = {NumberText.Exact(value)}",
            DateTimeOffset.UtcNow,
            UserAtHost(context),
            [KeyValuePair.Create(swept, value)],
            verdict,
            note ?? string.Empty);
        var bytes = OperatingPointWriter.Apply(document, value, record);
        var saved = AtomicFileSaver.TrySave(document, bytes);
        if (!saved.Succeeded)
        {
            context.Error.WriteLine($"{file}: error: {saved.Message}");
            return ExitCodes.BadInput;
        }

        context.Out.WriteLine($"{SafeText.Visible(file)}: saved {SafeText.Visible(swept)} = {NumberText.Exact(value)} ({verdict})");
        return check.Passed ? ExitCodes.Ok : ExitCodes.SpecViolated;
    }

    private static string UserAtHost(CliContext context)
    {
        string user = context.Environment.TryGetValue("USER", out var u) && !string.IsNullOrEmpty(u) ? u : Environment.UserName;
        return $"{user}@{Environment.MachineName}";
    }
}
