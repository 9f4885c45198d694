using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Time;

/// <summary>Strict stability of a closed loop's denominator, in the s-plane or the z-plane.</summary>
internal static class LoopStability
{
    /// <summary>
    /// True when every root of <paramref name="denominator"/> (in s) has a negative real part. All coefficients
    /// having one strict sign is checked first: it is necessary, and exact for poles at the origin, which a root
    /// finder may place a rounding error to either side.
    /// </summary>
    public static bool IsStableInS(Polynomial denominator)
    {
        if (denominator.IsZero)
        {
            return false;
        }

        double sign = Math.Sign(denominator.Leading);
        if (denominator.Coefficients.Any(c => Math.Sign(c) != sign))
        {
            return false;
        }

        return PolynomialRoots.Find(denominator).All(p => p.Real < 0.0);
    }

    /// <summary>True when every root of <paramref name="denominator"/> (in z) lies strictly inside the unit circle.</summary>
    public static bool IsStableInZ(Polynomial denominator) =>
        !denominator.IsZero && PolynomialRoots.Find(denominator).All(z => Complex.Abs(z) < 1.0);
}
