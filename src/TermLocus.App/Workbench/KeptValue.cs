namespace TermLocus.App.Workbench;

/// <summary>A swept value to keep when a plant file is read again from disk.</summary>
/// <param name="Parameter">The swept parameter's name.</param>
/// <param name="Value">Its value before the reload.</param>
public sealed record KeptValue(string Parameter, double Value);
