namespace TermLocus.Cli;

/// <summary>What the command line asks of the full-screen workbench.</summary>
/// <param name="Path">A plant file or a folder of them; null for the default library.</param>
/// <param name="NoColor">--no-color given (NO_COLOR is read by the workbench itself).</param>
/// <param name="Symbols">"braille", "ascii" or null for automatic.</param>
/// <param name="NoMouse">--no-mouse given.</param>
internal sealed record WorkbenchRequest(string? Path, bool NoColor, string? Symbols, bool NoMouse);
