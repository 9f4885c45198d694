using System.Collections.Immutable;
using System.Numerics;

namespace TermLocus.App.Plot;

/// <summary>One root-locus branch: the path of one closed-loop pole as the parameter sweeps, in sweep order.</summary>
/// <param name="Index">Branch number, used for its colour (0-based).</param>
/// <param name="Points">The path; consecutive points are joined by straight segments, non-finite points break it.</param>
public sealed record PlaneBranch(int Index, ImmutableArray<Complex> Points);
