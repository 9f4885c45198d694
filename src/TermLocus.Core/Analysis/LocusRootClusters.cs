using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>Groups numerically coincident roots (a multiple root comes out of the eigenvalue solver as a small cluster).</summary>
internal static class LocusRootClusters
{
    /// <summary>Roots closer than this share of the largest root magnitude (or 1) are one multiple root.</summary>
    internal const double RelativeRadius = 1e-6;

    /// <summary>Clusters as (mean, multiplicity), in the order their first member appears.</summary>
    internal static List<(Complex Center, int Multiplicity)> Group(IReadOnlyList<Complex> roots)
    {
        double size = 1.0;
        foreach (var r in roots)
        {
            size = Math.Max(size, r.Magnitude);
        }

        double radius = RelativeRadius * size;
        var assigned = new bool[roots.Count];
        var clusters = new List<(Complex, int)>();
        for (int i = 0; i < roots.Count; i++)
        {
            if (assigned[i])
            {
                continue;
            }

            Complex sum = roots[i];
            int count = 1;
            assigned[i] = true;
            for (int j = i + 1; j < roots.Count; j++)
            {
                if (!assigned[j] && Complex.Abs(roots[j] - roots[i]) <= radius)
                {
                    assigned[j] = true;
                    sum += roots[j];
                    count++;
                }
            }

            clusters.Add((sum / count, count));
        }

        return clusters;
    }

    /// <summary>True when |Im z| is below the cluster radius relative to max(|z|, 1).</summary>
    internal static bool IsNearlyReal(Complex z, double size) => Math.Abs(z.Imaginary) <= RelativeRadius * Math.Max(size, 1.0);
}
