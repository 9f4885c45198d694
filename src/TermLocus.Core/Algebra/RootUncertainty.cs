using System.Numerics;

namespace TermLocus.Core.Algebra;

/// <summary>
/// How far the computed roots of a polynomial can be trusted. Rounding leaves every root an exact root of a
/// polynomial a few rounding units away from the one given (see <see cref="PolynomialRoots"/>); how far that moves
/// the roots depends on their conditioning, from nothing for well-separated roots to (ε)^(1/k) for a root of
/// multiplicity k, and beyond any use for a high-order repeated root such as (s+1)^200. The estimate perturbs every
/// coefficient by <see cref="Perturbation"/> of itself, with two fixed sign patterns, and measures how far the roots
/// move: that is the size of the error rounding can cause, multiple roots included, without computing condition numbers.
/// </summary>
public static class RootUncertainty
{
    /// <summary>Relative size of the coefficient perturbation: a generous rounding error of the coefficients and the root finder.</summary>
    public const double Perturbation = 1e-14;

    /// <summary>A spread above this share of a root's magnitude is worth telling the user: the poles shown may be wrong in the third digit.</summary>
    public const double WorthWarning = 1e-3;

    /// <summary>
    /// The largest movement of any root of <paramref name="p"/> under the perturbation, relative to that root's
    /// magnitude (or, for roots near the origin, to the typical root magnitude). 0 for degree below 1; positive
    /// infinity when the perturbed roots cannot be found. <paramref name="roots"/> are the roots as found (any order).
    /// </summary>
    /// <exception cref="ArgumentException"><paramref name="roots"/> does not hold <c>p.Degree</c> roots.</exception>
    public static double RelativeSpread(Polynomial p, IReadOnlyList<Complex> roots)
    {
        ArgumentNullException.ThrowIfNull(p);
        ArgumentNullException.ThrowIfNull(roots);
        if (p.Degree < 1)
        {
            return 0.0;
        }

        if (roots.Count != p.Degree)
        {
            throw new ArgumentException($"Expected {p.Degree} roots, got {roots.Count}.", nameof(roots));
        }

        double floor = TypicalMagnitude(roots) * 1e-3;
        double worst = 0.0;
        foreach (int pattern in new[] { 0x5A3C96E1, 0x2D71B04F })
        {
            if (!PolynomialRoots.TryFind(Perturbed(p, pattern), out var moved) || moved.Length != roots.Count)
            {
                return double.PositiveInfinity;
            }

            worst = Math.Max(worst, LargestMove(roots, moved, floor));
        }

        return worst;
    }

    private static Polynomial Perturbed(Polynomial p, int pattern)
    {
        var c = p.Coefficients.ToArray();
        for (int k = 0; k < c.Length; k++)
        {
            // A fixed pseudo-random sign per coefficient: the same input always gives the same estimate.
            bool up = ((pattern >> (k % 31)) & 1) == 1 ^ (k / 31 % 2 == 1);
            c[k] *= up ? 1.0 + Perturbation : 1.0 - Perturbation;
        }

        return Polynomial.FromAscending(c);
    }

    // Greedy nearest matching is enough here: the estimate only needs the size of the movement, not which root went where.
    private static double LargestMove(IReadOnlyList<Complex> roots, Complex[] moved, double floor)
    {
        var taken = new bool[moved.Length];
        double worst = 0.0;
        foreach (var r in roots)
        {
            int best = -1;
            double distance = double.PositiveInfinity;
            for (int j = 0; j < moved.Length; j++)
            {
                double d = Complex.Abs(moved[j] - r);
                if (!taken[j] && d < distance)
                {
                    best = j;
                    distance = d;
                }
            }

            taken[best] = true;
            worst = Math.Max(worst, distance / Math.Max(Complex.Abs(r), floor));
        }

        return worst;
    }

    private static double TypicalMagnitude(IReadOnlyList<Complex> roots)
    {
        double sumLog = 0.0;
        int n = 0;
        foreach (var r in roots)
        {
            double m = Complex.Abs(r);
            if (m > 0 && double.IsFinite(m))
            {
                sumLog += Math.Log(m);
                n++;
            }
        }

        return n == 0 ? 1.0 : Math.Exp(sumLog / n);
    }
}
