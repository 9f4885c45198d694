using System.CommandLine;
using System.CommandLine.Invocation;
using TermLocus.App.Workbench;

namespace TermLocus.Cli;

/// <summary>
/// The root command's --help: the usual option and verb list, then the workbench keys, generated from the same key
/// table as the in-app help (with its caution), so the two can never disagree.
/// </summary>
internal sealed class HelpWithKeys(CommandLineAction standard, CliContext context) : SynchronousCommandLineAction
{
    /// <inheritdoc/>
    public override int Invoke(ParseResult parseResult)
    {
        int code = standard is SynchronousCommandLineAction sync ? sync.Invoke(parseResult) : 0;
        if (parseResult.CommandResult.Command is RootCommand)
        {
            context.Out.WriteLine("Workbench keys:");
            foreach (var line in HelpPresenter.Lines(GlyphChoice.For(context), 96))
            {
                context.Out.WriteLine("  " + line.TrimEnd());
            }
        }

        return code;
    }

    /// <summary>Wraps the help option of <paramref name="root"/>.</summary>
    public static void Install(RootCommand root, CliContext context)
    {
        foreach (var option in root.Options)
        {
            if (option is System.CommandLine.Help.HelpOption help && help.Action is { } action)
            {
                help.Action = new HelpWithKeys(action, context);
            }
        }
    }
}
