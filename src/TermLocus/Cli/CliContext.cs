namespace TermLocus.Cli;

/// <summary>What a verb may touch: its output streams and the environment it was started in.</summary>
/// <param name="Out">Standard output (reports, JSON, CSV).</param>
/// <param name="Error">Standard error (one-line messages).</param>
/// <param name="Environment">Environment variables (NO_COLOR, locale, ...), read once at start.</param>
/// <param name="OutputIsTerminal">True when stdout is a terminal (colour and symbols may be used).</param>
internal sealed record CliContext(
    TextWriter Out,
    TextWriter Error,
    IReadOnlyDictionary<string, string?> Environment,
    bool OutputIsTerminal);
