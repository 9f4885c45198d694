namespace TermLocus.App.Workbench;

/// <summary>A swept value worth jumping to (n/p keys), solved exactly by the locus engine.</summary>
/// <param name="Value">The swept value.</param>
/// <param name="Kind">What happens there.</param>
/// <param name="SpecKey">For a spec boundary, the spec's plant-file key; else null.</param>
public sealed record SweepMark(double Value, SweepMarkKind Kind, string? SpecKey);
