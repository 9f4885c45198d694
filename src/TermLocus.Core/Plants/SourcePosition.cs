namespace TermLocus.Core.Plants;

/// <summary>A place in a text file: 1-based line and 1-based column (in UTF-16 code units of that line).</summary>
public readonly record struct SourcePosition(int Line, int Column);
