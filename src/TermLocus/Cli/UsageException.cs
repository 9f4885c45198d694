namespace TermLocus.Cli;

/// <summary>A command line that parses but makes no sense (an unknown parameter in --set, a reversed span).</summary>
internal sealed class UsageException(string message) : Exception(message);
