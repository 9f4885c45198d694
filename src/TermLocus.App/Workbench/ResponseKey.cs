namespace TermLocus.App.Workbench;

/// <summary>What a step response depends on: the loop's inputs (every value but the swept one) and the swept value.</summary>
/// <param name="Loop">The loop's trace key.</param>
/// <param name="SweptValue">The swept value.</param>
public sealed record ResponseKey(TraceKey Loop, double SweptValue);
