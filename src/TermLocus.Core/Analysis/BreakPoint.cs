using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>A point where two or more branches meet: a multiple root of P(s; p) at a real swept value.</summary>
/// <param name="Location">The meeting point s, rad/s (on the real axis or, for complex break points, off it).</param>
/// <param name="Value">The swept value p there, solved to about 1e-12 relative.</param>
/// <param name="Kind">Breakaway or break-in.</param>
/// <param name="Meeting">How many branches meet there (2 or more).</param>
public sealed record BreakPoint(Complex Location, double Value, BreakPointKind Kind, int Meeting);
