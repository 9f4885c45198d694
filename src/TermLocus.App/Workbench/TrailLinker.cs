using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Analysis;

namespace TermLocus.App.Workbench;

/// <summary>
/// Joins the roots found at successive values of a parameter into one path per root: each root continues the open
/// path whose last point is nearest (closest pairs first). A root with no path to continue starts one; a path with
/// no root to continue (a root lost to infinity) ends.
/// </summary>
internal static class TrailLinker
{
    /// <summary>The paths through <paramref name="samples"/> (sorted by value), each in order of value.</summary>
    public static ImmutableArray<ImmutableArray<LocusPoint>> Link(IReadOnlyList<(double Value, ImmutableArray<Complex> Roots)> samples)
    {
        var done = new List<List<LocusPoint>>();
        var open = new List<List<LocusPoint>>();
        foreach (var (value, roots) in samples)
        {
            var pairs = new List<(double Distance, int Path, int Root)>();
            for (int p = 0; p < open.Count; p++)
            {
                for (int r = 0; r < roots.Length; r++)
                {
                    pairs.Add((Complex.Abs(open[p][^1].Pole - roots[r]), p, r));
                }
            }

            var pathTaken = new bool[open.Count];
            var rootTaken = new bool[roots.Length];
            foreach (var (_, p, r) in pairs.OrderBy(x => x.Distance))
            {
                if (!pathTaken[p] && !rootTaken[r])
                {
                    pathTaken[p] = rootTaken[r] = true;
                    open[p].Add(new LocusPoint(value, roots[r]));
                }
            }

            var next = new List<List<LocusPoint>>();
            for (int p = 0; p < open.Count; p++)
            {
                (pathTaken[p] ? next : done).Add(open[p]);
            }

            for (int r = 0; r < roots.Length; r++)
            {
                if (!rootTaken[r])
                {
                    next.Add([new LocusPoint(value, roots[r])]);
                }
            }

            open = next;
        }

        return done.Concat(open).Select(p => p.ToImmutableArray()).ToImmutableArray();
    }
}
