namespace TermLocus.Tests.Crash;

/// <summary>What the files looked like after one kill.</summary>
/// <param name="Held">The save whose version the file holds (-1: the version before any save), or null when it
/// holds none that is allowed.</param>
/// <param name="TempLeft">A temporary file of the save was still there: the kill fell between its creation and the
/// rename.</param>
/// <param name="Problem">What is wrong, or null.</param>
internal sealed record Judgement(long? Held, bool TempLeft, string? Problem);
