using System.Numerics;
using CsCheck;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Analysis;

public class BranchMatcherTests
{
    [Fact]
    public void Matching_costs_the_same_as_the_best_of_all_permutations()
    {
        // Checked against exhaustive enumeration of every pairing (brute force, common practice for n <= 7).
        var points = Gen.Select(Gen.Double[-3, 3], Gen.Double[-3, 3]).Select((x, y) => new Complex(x, y));
        Gen.Int[1, 7].SelectMany(n => Gen.Select(points.Array[n], points.Array[n])).Sample(pair =>
        {
            var (before, after) = pair;
            var match = new int[before.Length];
            new BranchMatcher(before.Length).Match(before, after, match);

            Assert.Equal(before.Length, match.Distinct().Count());
            Assert.Equal(BestCost(before, after), Cost(before, after, match), 1e-9);
        }, iter: 300, threads: 1);
    }

    [Fact]
    public void Poles_that_moved_a_little_are_paired_with_themselves_whatever_the_order()
    {
        var before = new[] { new Complex(-1, 1), new Complex(-1, -1), new Complex(-3, 0) };
        var after = new[] { new Complex(-3.01, 0), new Complex(-1.01, -0.99), new Complex(-0.99, 1.01) };
        var match = new int[3];
        new BranchMatcher(3).Match(before, after, match);
        Assert.Equal(new[] { 2, 1, 0 }, match);
    }

    [Fact]
    public void Crossing_pairs_at_a_break_point_use_least_total_movement_not_nearest_neighbours()
    {
        // Two real poles just before a breakaway at 0 and the complex pair just after: the nearest neighbour of
        // both is the same point, so only a global assignment can pair them (common practice).
        var before = new[] { new Complex(-0.01, 0), new Complex(0.01, 0) };
        var after = new[] { new Complex(0, 0.012), new Complex(0, -0.012) };
        var match = new int[2];
        new BranchMatcher(2).Match(before, after, match);
        Assert.NotEqual(match[0], match[1]);
        Assert.Equal(BestCost(before, after), Cost(before, after, match), 1e-15);
    }

    private static double Cost(Complex[] a, Complex[] b, int[] match) =>
        a.Select((x, i) => Math.Pow(Complex.Abs(x - b[match[i]]), 2)).Sum();

    private static double BestCost(Complex[] a, Complex[] b) =>
        Permutations(Enumerable.Range(0, a.Length).ToArray()).Min(p => Cost(a, b, p));

    private static IEnumerable<int[]> Permutations(int[] items)
    {
        if (items.Length <= 1)
        {
            yield return items;
            yield break;
        }

        for (int i = 0; i < items.Length; i++)
        {
            var rest = items.Where((_, k) => k != i).ToArray();
            foreach (var tail in Permutations(rest))
            {
                yield return [items[i], .. tail];
            }
        }
    }
}
