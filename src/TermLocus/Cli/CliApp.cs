using System.CommandLine;
using TermLocus.Core.Plants;

namespace TermLocus.Cli;

/// <summary>
/// The whole command line: parses arguments, runs the verb or the workbench, and turns every expected failure into
/// exit code 2 with one line on stderr. Never calls Environment.Exit; never prints a stack trace for bad input.
/// </summary>
internal sealed class CliApp(CliContext unguarded, Func<WorkbenchRequest, int> runWorkbench, IReadOnlyList<IVerb> verbs)
{
    // Text from plant files, file names and error messages can carry terminal controls; no verb writes around this.
    private readonly CliContext context = TerminalSafeWriter.Guard(unguarded);

    /// <summary>Parses and runs <paramref name="args"/>; returns the exit code.</summary>
    public int Run(IReadOnlyList<string> args)
    {
        var root = BuildRoot();
        var parsed = root.Parse(args);
        if (parsed.Errors.Count > 0)
        {
            context.Error.WriteLine($"termlocus: error: {parsed.Errors[0].Message} (see termlocus --help)");
            return ExitCodes.BadInput;
        }

        try
        {
            return parsed.Invoke(new InvocationConfiguration
            {
                Output = context.Out,
                Error = context.Error,
                EnableDefaultExceptionHandler = false,
            });
        }
        catch (PlantFileException e)
        {
            context.Error.WriteLine(e.Error.ToString());
            return ExitCodes.BadInput;
        }
        catch (UsageException e)
        {
            context.Error.WriteLine($"termlocus: error: {e.Message}");
            return ExitCodes.BadInput;
        }
        catch (Exception e) when (parsed.CommandResult.Command is not RootCommand && IsRefusedInput(e))
        {
            // The verbs check what they can up front (spans, --set values); this is the last guard, so input that
            // Core still refuses (a value that overflows the loop's coefficients, say) ends in one line, not a trace.
            context.Error.WriteLine($"termlocus: error: cannot compute this input: {OneLine(e.Message)}");
            return ExitCodes.BadInput;
        }
    }

    // The exceptions Core documents for input it cannot handle; anything else is a bug and keeps its stack trace.
    private static bool IsRefusedInput(Exception e) =>
        e is ArgumentException or ArithmeticException or InvalidOperationException;

    private static string OneLine(string text) => string.Join(' ', text.Split(['\r', '\n'], StringSplitOptions.RemoveEmptyEntries));

    private RootCommand BuildRoot()
    {
        var path = new Argument<string?>("PATH")
        {
            Description = "A plant file or a folder of them (default: ./plants, else the bundled library)",
            Arity = ArgumentArity.ZeroOrOne,
        };
        // An unknown option would otherwise be taken for a path and open the workbench on it.
        path.Validators.Add(result =>
        {
            var token = result.Tokens.Count > 0 ? result.Tokens[0].Value : null;
            if (token is not null && token.StartsWith('-'))
            {
                result.AddError($"unknown option '{token}'");
            }
        });
        var noColor = CommonOptions.NoColor();
        var symbols = CommonOptions.Symbols();
        var noMouse = new Option<bool>("--no-mouse") { Description = "Leave the mouse to the terminal (its own select and copy)" };
        var root = new RootCommand("TermLocus: root-locus design of feedback loops in the terminal")
        {
            path, noColor, symbols, noMouse,
        };
        foreach (var verb in verbs)
        {
            root.Subcommands.Add(verb.Build(context));
        }

        HelpWithKeys.Install(root, context);
        root.SetAction(result => runWorkbench(new WorkbenchRequest(
            result.GetValue(path), result.GetValue(noColor), result.GetValue(symbols), result.GetValue(noMouse))));
        return root;
    }
}
