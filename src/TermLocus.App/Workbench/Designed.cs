using TermLocus.Core.Analysis;

namespace TermLocus.App.Workbench;

/// <summary>
/// The robust design of a plant's swept value came back: the intervals of its range where every spec holds at
/// nominal and at every band corner, and the recommended value (the one <c>termlocus design</c> prints).
/// </summary>
/// <param name="PlantPath">The plant it is for.</param>
/// <param name="Result">The design, or null when it could not be made.</param>
/// <param name="Problem">Why not, or null.</param>
public sealed record Designed(string PlantPath, DesignResult? Result, string? Problem) : Message;
