using System.CommandLine;

namespace TermLocus.Cli;

/// <summary>Options shared by several verbs, created fresh per command (an option belongs to one parent).</summary>
internal static class CommonOptions
{
    /// <summary>--set NAME=VALUE, repeatable.</summary>
    public static Option<string[]> Set() => new("--set")
    {
        Description = "Override a parameter's value (repeatable), e.g. --set Kc=1.2",
        HelpName = "NAME=VALUE",
        Arity = ArgumentArity.ZeroOrMore,
        AllowMultipleArgumentsPerToken = false,
    };

    /// <summary>--json.</summary>
    public static Option<bool> Json() => new("--json") { Description = "Print the versioned JSON document instead of text" };

    /// <summary>--no-color.</summary>
    public static Option<bool> NoColor() => new("--no-color") { Description = "Never use colour (NO_COLOR is honoured too)" };

    /// <summary>--symbols braille|ascii.</summary>
    public static Option<string> Symbols()
    {
        var option = new Option<string>("--symbols") { Description = "Plot symbols: braille or ascii (default: by locale)", HelpName = "braille|ascii" };
        option.AcceptOnlyFromAmong("braille", "ascii");
        return option;
    }

    /// <summary>--from: the start of the swept span (default: the file's range, else the automatic span).</summary>
    public static Option<double?> From() => new("--from") { Description = "Start of the swept span (default: the file's range)" };

    /// <summary>--to: the end of the swept span.</summary>
    public static Option<double?> To() => new("--to") { Description = "End of the swept span" };

    /// <summary>The plant named by <paramref name="file"/> with the <paramref name="set"/> overrides (see <see cref="PlantInput.Load"/>).</summary>
    public static PlantInput LoadPlant(ParseResult result, Argument<string> file, Option<string[]> set) =>
        PlantInput.Load(result.GetValue(file)!, ValueOverrides.Parse(result.GetValue(set) ?? []));

    /// <summary>A required plant-file argument.</summary>
    public static Argument<string> File() => new("FILE") { Description = "A plant file (.toml)" };
}
