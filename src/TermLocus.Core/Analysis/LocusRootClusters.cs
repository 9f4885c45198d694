using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>Groups numerically coincident roots (a multiple root comes out of any double-precision solver as a small
/// cluster).</summary>
internal static class LocusRootClusters
{
    /// <summary>Roots closer than this share of the largest root magnitude (or 1) may be one multiple root.</summary>
    internal const double RelativeRadius = 1e-6;

    /// <summary>Widest search for members of one multiple root: a k-fold root comes out of a double-precision solver
    /// spread over about eps^(1/k) of the scale (2e-4 for k = 4).</summary>
    private const double WidestRadius = 1e-3;

    private const double MachineEpsilon = 2.220446049250313e-16;

    /// <summary>
    /// Clusters as (mean, multiplicity), in the order their first member appears. Roots within
    /// <see cref="RelativeRadius"/> always join; farther ones (up to <see cref="WidestRadius"/>) join only while the
    /// cluster stays within 10·eps^(1/k) of the scale for its size k, the spread a k-fold root shows.
    /// </summary>
    internal static List<(Complex Center, int Multiplicity)> Group(IReadOnlyList<Complex> roots)
    {
        double size = 1.0;
        foreach (var r in roots)
        {
            size = Math.Max(size, r.Magnitude);
        }

        var assigned = new bool[roots.Count];
        var clusters = new List<(Complex, int)>();
        for (int i = 0; i < roots.Count; i++)
        {
            if (assigned[i])
            {
                continue;
            }

            var members = Enumerable.Range(i, roots.Count - i)
                .Where(j => !assigned[j] && Complex.Abs(roots[j] - roots[i]) <= WidestRadius * size)
                .OrderBy(j => Complex.Abs(roots[j] - roots[i]))
                .ToList();
            int k = members.Count;
            while (k > 1 && Complex.Abs(roots[members[k - 1]] - roots[i]) > Allowed(k) * size)
            {
                k--;
            }

            Complex sum = Complex.Zero;
            foreach (int j in members.Take(k))
            {
                assigned[j] = true;
                sum += roots[j];
            }

            clusters.Add((sum / k, k));
        }

        return clusters;
    }

    private static double Allowed(int multiplicity) =>
        Math.Max(RelativeRadius, 10.0 * Math.Pow(MachineEpsilon, 1.0 / multiplicity));

    /// <summary>True when |Im z| is below the cluster radius relative to max(|z|, 1).</summary>
    internal static bool IsNearlyReal(Complex z, double size) => Math.Abs(z.Imaginary) <= RelativeRadius * Math.Max(size, 1.0);
}
