using TermLocus.Cli;

namespace TermLocus.Tests.Cli;

/// <summary>Runs the command line in process with captured streams.</summary>
internal static class CliRunner
{
    public static (int Code, string Out, string Err) Run(params string[] args) => RunWith(null, args);

    public static (int Code, string Out, string Err) RunWith(Func<WorkbenchRequest, int>? workbench, params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var env = new Dictionary<string, string?>(StringComparer.Ordinal) { ["LANG"] = "C.UTF-8" };
        var context = new CliContext(stdout, stderr, env, OutputIsTerminal: false);
        var app = new CliApp(context, workbench ?? (_ => 0), VerbCatalog.All());
        int code = app.Run(args);
        return (code, stdout.ToString(), stderr.ToString());
    }
}
