using System.Collections.Immutable;

namespace TermLocus.Core.Analysis;

/// <summary>Asymptotes of an affine family's locus, from the coefficients (no roots needed).</summary>
internal static class AsymptoteFinder
{
    /// <summary>One set per sign of p present in [from, to] (positive first); empty when n &lt;= m.</summary>
    internal static ImmutableArray<AsymptoteSet> Find(AffineSplit split, double from, double to)
    {
        int n = split.A.Degree, m = split.B.Degree;
        int count = n - m;
        if (count <= 0)
        {
            return [];
        }

        // Σpoles = −a_{n−1}/a_n and Σzeros = −b_{m−1}/b_m (Vieta), exact from the coefficients.
        double poleSum = -split.A[n - 1] / split.A[n];
        double zeroSum = m >= 1 ? -split.B[m - 1] / split.B[m] : 0.0;
        double centroid = (poleSum - zeroSum) / count;
        var sets = ImmutableArray.CreateBuilder<AsymptoteSet>();
        foreach (var sign in LocusAngles.SignsIn(from, to))
        {
            bool rule180 = LocusAngles.Uses180Degrees(split, sign);
            var angles = Enumerable.Range(0, count)
                .Select(k => LocusAngles.Normalize(rule180 ? (2 * k + 1) * 180.0 / count : k * 360.0 / count))
                .ToImmutableArray();
            sets.Add(new AsymptoteSet(sign, centroid, angles, rule180));
        }

        return sets.ToImmutable();
    }
}
