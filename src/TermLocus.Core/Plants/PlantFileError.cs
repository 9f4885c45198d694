namespace TermLocus.Core.Plants;

/// <summary>A located problem in a plant file, printed as <c>FILE:LINE:COL: error: MESSAGE</c> on one line.</summary>
/// <param name="File">The file as the user named it.</param>
/// <param name="Position">1-based line and column of the offending key or character.</param>
/// <param name="Message">What is wrong and what was expected, one line, no trailing period needed.</param>
public sealed record PlantFileError(string File, SourcePosition Position, string Message)
{
    /// <inheritdoc/>
    public override string ToString() => $"{File}:{Position.Line}:{Position.Column}: error: {Message}";
}

/// <summary>Thrown when a plant file cannot be loaded or its loop cannot be built; carries the located error.</summary>
public sealed class PlantFileException : Exception
{
    /// <summary>Creates the exception from its located error.</summary>
    public PlantFileException(PlantFileError error)
        : base(error.ToString()) => Error = error;

    /// <summary>The located error.</summary>
    public PlantFileError Error { get; }
}
