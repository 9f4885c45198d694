using TermLocus.Cli;

namespace TermLocus;

/// <summary>Entry point of the <c>termlocus</c> executable.</summary>
public static class Program
{
    /// <summary>Runs the command line and returns its exit code.</summary>
    public static int Main(string[] args)
    {
        var environment = Environment.GetEnvironmentVariables()
            .Cast<System.Collections.DictionaryEntry>()
            .ToDictionary(e => (string)e.Key, e => (string?)e.Value, StringComparer.Ordinal);
        var context = new CliContext(Console.Out, Console.Error, environment, !Console.IsOutputRedirected);
        var app = new CliApp(context, RunWorkbench, VerbCatalog.All());
        return app.Run(args);
    }

    private static int RunWorkbench(WorkbenchRequest request) =>
        Tui.WorkbenchApp.Run(
            new Tui.WorkbenchOptions(request.Path, request.NoColor, request.Symbols, request.NoMouse), Console.Error);
}
