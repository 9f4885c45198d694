namespace TermLocus.App.Workbench;

/// <summary>The user clicked a locus branch on the plane; the swept value there was found.</summary>
/// <param name="Value">The swept value at the picked point.</param>
public sealed record ValuePicked(double Value) : Message;
