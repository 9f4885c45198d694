namespace TermLocus.Core.Analysis;

/// <summary>A swept value at which a closed-loop pole lies on the imaginary axis, at s = ±jω.</summary>
/// <param name="Omega">ω &gt;= 0, rad/s; 0 for a real pole passing through the origin.</param>
/// <param name="Value">The swept value p there, solved to at least 1e-9 relative.</param>
/// <param name="Direction">Which way the pole goes as p increases.</param>
public sealed record AxisCrossing(double Omega, double Value, AxisCrossingDirection Direction);
