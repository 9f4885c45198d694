using System.Collections.Immutable;
using TermLocus.Core.Analysis;

namespace TermLocus.App.Workbench;

/// <summary>
/// The heavy, cached part of what the workbench shows for one set of other-parameter values: the traced branches
/// over the range and the swept values worth jumping to.
/// </summary>
/// <param name="Key">The inputs it was computed from.</param>
/// <param name="Branches">Locus branches as polylines, each ordered by swept value.</param>
/// <param name="Marks">Spec boundaries, stability crossings and break points inside the range, sorted by value.</param>
public sealed record LocusAnalysis(TraceKey Key, ImmutableArray<ImmutableArray<LocusPoint>> Branches, ImmutableArray<SweepMark> Marks);
