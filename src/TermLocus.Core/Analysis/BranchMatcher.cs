using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Pairs the poles at one swept value with the poles at the next so that the total squared movement is least
/// (a minimum-cost assignment). When every pole moved less than half the smallest distance between the earlier
/// poles, nearest neighbours are provably the least-cost pairing and the O(n³) assignment is skipped.
/// Holds scratch arrays, so one instance serves one thread.
/// </summary>
internal sealed class BranchMatcher
{
    private readonly int n;
    private readonly double[] cost;
    private readonly double[] rowPotential;
    private readonly double[] columnPotential;
    private readonly double[] minSlack;
    private readonly int[] rowOfColumn;
    private readonly int[] way;
    private readonly bool[] used;

    internal BranchMatcher(int count)
    {
        n = count;
        cost = new double[count * count];
        rowPotential = new double[count + 1];
        columnPotential = new double[count + 1];
        minSlack = new double[count + 1];
        rowOfColumn = new int[count + 1];
        way = new int[count + 1];
        used = new bool[count + 1];
    }

    /// <summary>
    /// Fills <paramref name="match"/> so that <c>after[match[i]]</c> is the continuation of <c>before[i]</c>,
    /// with the least Σ|before[i] − after[match[i]]|². Both spans have the matcher's count.
    /// </summary>
    internal void Match(ReadOnlySpan<Complex> before, ReadOnlySpan<Complex> after, Span<int> match)
    {
        if (!TryNearest(before, after, match))
        {
            Assign(before, after, match);
        }
    }

    private bool TryNearest(ReadOnlySpan<Complex> before, ReadOnlySpan<Complex> after, Span<int> match)
    {
        double largestMove = 0.0;
        double closestPair = double.PositiveInfinity;
        Span<bool> taken = n <= 256 ? stackalloc bool[n] : new bool[n];
        for (int i = 0; i < n; i++)
        {
            int best = -1;
            double bestDistance = double.PositiveInfinity;
            for (int j = 0; j < n; j++)
            {
                double d = SquaredDistance(before[i], after[j]);
                if (d < bestDistance)
                {
                    bestDistance = d;
                    best = j;
                }
            }

            if (best < 0 || taken[best])
            {
                return false;
            }

            taken[best] = true;
            match[i] = best;
            largestMove = Math.Max(largestMove, bestDistance);
            for (int k = i + 1; k < n; k++)
            {
                closestPair = Math.Min(closestPair, SquaredDistance(before[i], before[k]));
            }
        }

        // Squared distances: move < separation/2  <=>  move² < separation²/4.
        return largestMove < 0.25 * closestPair;
    }

    /// <summary>The Hungarian method with potentials (shortest augmenting paths), O(n³).</summary>
    private void Assign(ReadOnlySpan<Complex> before, ReadOnlySpan<Complex> after, Span<int> match)
    {
        for (int i = 0; i < n; i++)
        {
            for (int j = 0; j < n; j++)
            {
                cost[(i * n) + j] = SquaredDistance(before[i], after[j]);
            }
        }

        Array.Clear(rowPotential);
        Array.Clear(columnPotential);
        Array.Clear(rowOfColumn);
        Array.Clear(way);
        for (int row = 1; row <= n; row++)
        {
            AugmentFrom(row);
        }

        for (int column = 1; column <= n; column++)
        {
            match[rowOfColumn[column] - 1] = column - 1;
        }
    }

    private void AugmentFrom(int row)
    {
        rowOfColumn[0] = row;
        int column0 = 0;
        Array.Fill(minSlack, double.PositiveInfinity);
        Array.Clear(used);
        do
        {
            used[column0] = true;
            var (delta, column1) = CheapestColumn(rowOfColumn[column0], column0);
            ShiftPotentials(delta);
            column0 = column1;
        }
        while (rowOfColumn[column0] != 0);

        do
        {
            int column1 = way[column0];
            rowOfColumn[column0] = rowOfColumn[column1];
            column0 = column1;
        }
        while (column0 != 0);
    }

    /// <summary>Updates the slack of every free column from row <paramref name="row0"/>; returns the least slack and
    /// its column.</summary>
    private (double Delta, int Column) CheapestColumn(int row0, int column0)
    {
        double delta = double.PositiveInfinity;
        int column1 = 0;
        for (int j = 1; j <= n; j++)
        {
            if (used[j])
            {
                continue;
            }

            double slack = cost[((row0 - 1) * n) + j - 1] - rowPotential[row0] - columnPotential[j];
            if (slack < minSlack[j])
            {
                minSlack[j] = slack;
                way[j] = column0;
            }

            if (minSlack[j] < delta)
            {
                delta = minSlack[j];
                column1 = j;
            }
        }

        return (delta, column1);
    }

    private void ShiftPotentials(double delta)
    {
        for (int j = 0; j <= n; j++)
        {
            if (used[j])
            {
                rowPotential[rowOfColumn[j]] += delta;
                columnPotential[j] -= delta;
            }
            else
            {
                minSlack[j] -= delta;
            }
        }
    }

    private static double SquaredDistance(Complex a, Complex b)
    {
        double dx = a.Real - b.Real;
        double dy = a.Imaginary - b.Imaginary;
        return (dx * dx) + (dy * dy);
    }
}
