using System.Numerics;

namespace TermLocus.App.Workbench;

/// <summary>One spec a closed-loop pole does not meet, as the workbench shows it.</summary>
/// <param name="SpecKey">The plant-file key of the spec, e.g. <c>min_damping</c>.</param>
/// <param name="Limit">The limit from the file, in the spec's unit.</param>
/// <param name="Actual">The pole's figure in the same unit.</param>
/// <param name="Margin">Signed distance to the limit in the spec's unit, negative when violated.</param>
/// <param name="Pole">The pole that misses the spec.</param>
public sealed record SpecMiss(string SpecKey, double Limit, double Actual, double Margin, Complex Pole);
