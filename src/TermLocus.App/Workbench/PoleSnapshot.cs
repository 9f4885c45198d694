using System.Collections.Immutable;
using System.Numerics;

namespace TermLocus.App.Workbench;

/// <summary>The closed-loop poles at one swept value and the specs they miss. Cheap: recomputed on every step.</summary>
/// <param name="Value">The swept value.</param>
/// <param name="Poles">Every closed-loop pole (hidden ones included), sorted by real part then imaginary part.</param>
/// <param name="Misses">Every spec a pole misses, worst (smallest margin relative to its limit) first.</param>
/// <param name="Problem">Why there are no poles at this value (the loop cannot be formed there), or null.</param>
public sealed record PoleSnapshot(double Value, ImmutableArray<Complex> Poles, ImmutableArray<SpecMiss> Misses, string? Problem = null)
{
    /// <summary>True when no pole misses any spec (and the loop could be formed).</summary>
    public bool AllMet => Misses.IsEmpty && Problem is null;

    /// <summary>The specs that <paramref name="pole"/> (or its conjugate) misses.</summary>
    public ImmutableArray<SpecMiss> MissesOf(Complex pole) =>
        Misses.Where(m => SamePair(m.Pole, pole)).ToImmutableArray();

    internal static bool SamePair(Complex a, Complex b)
    {
        double scale = Math.Max(1e-12, Math.Max(Complex.Abs(a), Complex.Abs(b)));
        return Complex.Abs(a - b) <= 1e-9 * scale || Complex.Abs(a - Complex.Conjugate(b)) <= 1e-9 * scale;
    }
}
