using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Analysis;

namespace TermLocus.App.Workbench;

/// <summary>The closed-loop poles at one swept value and the specs they miss. Cheap: recomputed on every step.</summary>
/// <param name="Value">The swept value.</param>
/// <param name="Poles">Every closed-loop pole (hidden ones included), sorted by real part then imaginary part; roots
/// in the loop's own plane (z for a sampled loop).</param>
/// <param name="Misses">Every spec a pole misses, worst (smallest margin relative to its limit) first; each names
/// the root as drawn.</param>
/// <param name="Problem">Why there are no poles at this value (the loop cannot be formed there), or null.</param>
public sealed record PoleSnapshot(double Value, ImmutableArray<Complex> Poles, ImmutableArray<SpecMiss> Misses, string? Problem = null)
{
    /// <summary>The plane of <see cref="Poles"/>; figures are read through its equivalent s.</summary>
    public LoopPlane Plane { get; init; } = LoopPlane.Continuous;

    /// <summary>Per pole (upper member of a pair): its worst figures across the band and its sensitivity; empty
    /// without a varied parameter.</summary>
    public ImmutableArray<PoleBandFigures> BandFigures { get; init; } = [];

    /// <summary>The parameter <see cref="BandFigures"/> are about (an identifier), or null.</summary>
    public string? VariedParameter { get; init; }

    /// <summary>True when no pole misses any spec (and the loop could be formed).</summary>
    public bool AllMet => Misses.IsEmpty && Problem is null;

    /// <summary>The poles that do not decay (in the right half-plane, or outside the unit circle), least stable first.</summary>
    public ImmutableArray<Complex> Unstable =>
        Poles.Where(p => !Plane.IsStable(p)).OrderByDescending(p => Plane.ToEquivalentS(p).Real).ToImmutableArray();

    /// <summary>The specs that <paramref name="pole"/> (or its conjugate) misses.</summary>
    public ImmutableArray<SpecMiss> MissesOf(Complex pole) =>
        Misses.Where(m => ConjugatePair.Matches(m.Pole, pole)).ToImmutableArray();

    /// <summary>The band figures of <paramref name="pole"/> (or its conjugate), or null.</summary>
    public PoleBandFigures? BandFiguresOf(Complex pole) => BandFigures.FirstOrDefault(f => ConjugatePair.Matches(f.Pole, pole));
}
