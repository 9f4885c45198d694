using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Matching a pole against another that may be its complex conjugate: reports list one pole of each conjugate pair,
/// while root lists hold both.
/// </summary>
public static class ConjugatePair
{
    /// <summary>Relative distance under which two poles are the same, to the larger magnitude (taken as at least
    /// 1e-12, so two poles at the origin match and near it the test is absolute, 1e-21).</summary>
    public const double RelativeTolerance = 1e-9;

    /// <summary>
    /// True when <paramref name="a"/> equals <paramref name="b"/> or its conjugate to within
    /// <see cref="RelativeTolerance"/>; false for any non-finite input.
    /// </summary>
    public static bool Matches(Complex a, Complex b)
    {
        if (!Complex.IsFinite(a) || !Complex.IsFinite(b))
        {
            return false;
        }

        double scale = Math.Max(1e-12, Math.Max(Complex.Abs(a), Complex.Abs(b)));
        return Complex.Abs(a - b) <= RelativeTolerance * scale
            || Complex.Abs(a - Complex.Conjugate(b)) <= RelativeTolerance * scale;
    }
}
