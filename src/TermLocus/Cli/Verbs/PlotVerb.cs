using System.CommandLine;
using System.Globalization;
using TermLocus.App.Canvas;
using TermLocus.App.Plot;
using TermLocus.App.Text;
using TermLocus.Core.Analysis;

namespace TermLocus.Cli.Verbs;

/// <summary><c>termlocus plot FILE [--size WxH] [--symbols braille|ascii]</c>: the plane with trails, once, to stdout.</summary>
internal sealed class PlotVerb : IVerb
{
    /// <inheritdoc/>
    public Command Build(CliContext context)
    {
        var file = CommonOptions.File();
        var size = new Option<string>("--size") { Description = "Plot size in cells, e.g. 100x30 (default 80x24)", HelpName = "WxH" };
        var symbols = CommonOptions.Symbols();
        var set = CommonOptions.Set();
        var command = new Command("plot", "Draw the locus with its spec limits and the poles at the current value, once") { file, size, symbols, set };
        command.SetAction(result =>
        {
            var (columns, rows) = ParseSize(result.GetValue(size) ?? "80x24");
            var chosen = SymbolChoice.Detect(context.Environment, result.GetValue(symbols));
            var input = CommonOptions.LoadPlant(result, file, set);
            var study = LocusInput.Study(input, null, null);
            var check = LoopCheck.Run(input.Model, input.Values);
            var current = LocusTracer.PolesAt(input.Model.Family(input.Plant.Loop.Sweep, input.Values), input.Values[input.Plant.Loop.Sweep]);
            var violating = current.Select(p => Misses(p, check, input.Model.Plane)).ToArray();
            int plotRows = rows - 2;
            var (scene, view) = LocusScene.Build(study, input.Plant.Specs, current, violating, columns, plotRows);
            var rendered = PlaneRenderer.Render(scene, view, columns, plotRows, chosen);
            var glyphs = chosen == CanvasSymbols.Braille ? Glyphs.Unicode : Glyphs.Ascii;
            context.Out.WriteLine(SafeText.Fit(
                $"{input.Plant.Title}: {input.Plant.Loop.Sweep} = {NumberText.Exact(input.Values[input.Plant.Loop.Sweep])} ({(study.Plane.IsSampled ? "z" : "s")}-plane)", columns));
            foreach (var line in rendered.Lines)
            {
                context.Out.WriteLine(line.TrimEnd());
            }

            context.Out.WriteLine(PlaneLegend.Line(chosen, columns));
            return ExitCodes.Ok;
        });
        return command;
    }

    // A root misses a spec when its equivalent s-plane pole is among the nominal violations (conjugates included).
    private static bool Misses(System.Numerics.Complex root, LoopCheckResult check, LoopPlane plane)
    {
        var s = plane.ToEquivalentS(root);
        return check.Nominal.Violations.Any(v => ConjugatePair.Matches(v.Pole, s));
    }

    private static (int Columns, int Rows) ParseSize(string text)
    {
        var parts = text.ToLowerInvariant().Split('x');
        if (parts.Length == 2
            && int.TryParse(parts[0], NumberStyles.None, CultureInfo.InvariantCulture, out int w)
            && int.TryParse(parts[1], NumberStyles.None, CultureInfo.InvariantCulture, out int h)
            && w is >= 20 and <= 400 && h is >= 8 and <= 200)
        {
            return (w, h);
        }

        throw new UsageException($"--size expects WxH with W from 20 to 400 and H from 8 to 200, got '{text}'");
    }
}
