namespace TermLocus.Cli;

/// <summary>The exit codes every verb keeps to (see the command-line contract).</summary>
internal static class ExitCodes
{
    /// <summary>Done, and every spec met.</summary>
    public const int Ok = 0;

    /// <summary>Done, and a spec is violated (or no feasible interval).</summary>
    public const int SpecViolated = 1;

    /// <summary>Bad input or usage; a one-line message went to stderr and nothing to stdout.</summary>
    public const int BadInput = 2;
}
