using System.Collections.Immutable;
using System.Numerics;

namespace TermLocus.App.Plot;

/// <summary>A spec limit drawn as a polyline. The plot does no mapping of its own: s-plane builders live in
/// <see cref="SPlaneBoundaries"/>, and z-plane contours arrive already mapped through z = e^{sT}.</summary>
/// <param name="Kind">What the limit is.</param>
/// <param name="Points">The polyline; clipped to the view when drawn, so it may reach far outside.</param>
public sealed record BoundaryCurve(BoundaryKind Kind, ImmutableArray<Complex> Points);
