using System.CommandLine;

namespace TermLocus.Cli;

/// <summary>One headless verb: builds its System.CommandLine command, whose action returns an exit code.</summary>
internal interface IVerb
{
    /// <summary>The command with its arguments, options and action; the action writes only through <paramref name="context"/>.</summary>
    Command Build(CliContext context);
}
