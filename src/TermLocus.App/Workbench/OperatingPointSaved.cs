using TermLocus.Core.Plants;

namespace TermLocus.App.Workbench;

/// <summary>The swept value was saved into the plant file.</summary>
/// <param name="Plant">The plant as now on disk.</param>
/// <param name="Document">The file as now on disk (for the next save), or null when not read back.</param>
/// <param name="Value">The value saved.</param>
/// <param name="QuitAfter">The save was the answer to the quit question.</param>
public sealed record OperatingPointSaved(Plant Plant, PlantDocument? Document, double Value, bool QuitAfter) : Message;
