using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Plants;

/// <summary>Finds the poles of a loop gain that a zero cancels: roots common to a numerator and a denominator.</summary>
internal static class LoopModelHiddenPoles
{
    /// <summary>
    /// Matches each denominator root to the nearest numerator root not yet used; a pair closer than
    /// <paramref name="relativeTolerance"/>·max(1, |root|) is a hidden pole, reported at the denominator root.
    /// Sorted by real part, then imaginary part.
    /// </summary>
    public static ImmutableArray<Complex> Find(
        IEnumerable<Polynomial> numerators, IEnumerable<Polynomial> denominators, double relativeTolerance)
    {
        var zeros = RootsOf(numerators);
        var poles = RootsOf(denominators);
        var used = new bool[zeros.Count];
        var hidden = new List<Complex>();
        foreach (var pole in poles)
        {
            int nearest = -1;
            double nearestDistance = double.PositiveInfinity;
            for (int i = 0; i < zeros.Count; i++)
            {
                double d = Complex.Abs(zeros[i] - pole);
                if (!used[i] && d < nearestDistance)
                {
                    nearest = i;
                    nearestDistance = d;
                }
            }

            if (nearest >= 0 && nearestDistance <= relativeTolerance * Math.Max(1.0, Complex.Abs(pole)))
            {
                used[nearest] = true;
                hidden.Add(pole);
            }
        }

        hidden.Sort((a, b) => a.Real != b.Real ? a.Real.CompareTo(b.Real) : a.Imaginary.CompareTo(b.Imaginary));
        return [.. hidden];
    }

    private static List<Complex> RootsOf(IEnumerable<Polynomial> polynomials) =>
        polynomials.Where(p => p.Degree >= 1).SelectMany(PolynomialRoots.Find).ToList();
}
