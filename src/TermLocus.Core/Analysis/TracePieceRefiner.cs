using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Traces one piece of a locus (a value range over which the degree of P(s; p) is constant): a coarse even sampling
/// in the warped parameter, then passes that halve every segment whose matched poles jump more than the step
/// bound, until all segments meet it or the value budget runs out. Poles are paired step to step by least total
/// squared movement, never by index.
/// </summary>
internal sealed class TracePieceRefiner
{
    /// <summary>Segments narrower than this share of |u| (warped parameter) are not split further.</summary>
    private const double FinestWarpedStep = 1e-12;

    private readonly TraceCoefficients coefficients;
    private readonly TraceParameterWarp warp;
    private readonly int degree;
    private readonly double scale;
    private readonly double fraction;
    private readonly TraceBudget budget;
    private readonly BranchMatcher matcher;
    private readonly double[] buffer;

    internal TracePieceRefiner(
        TraceCoefficients coefficients, TraceParameterWarp warp, int degree, double scale, double fraction, TraceBudget budget)
    {
        this.coefficients = coefficients;
        this.warp = warp;
        this.degree = degree;
        this.scale = scale;
        this.fraction = fraction;
        this.budget = budget;
        matcher = new BranchMatcher(degree);
        buffer = new double[degree + 1];
    }

    /// <summary>Traces [pStart, pEnd] starting from <paramref name="intervals"/> even warped steps.</summary>
    internal (ImmutableArray<ImmutableArray<LocusPoint>> Branches, bool Complete) Run(double pStart, double pEnd, int intervals)
    {
        var samples = InitialSamples(pStart, pEnd, intervals);
        if (samples.Count == 0)
        {
            return ([], false);
        }

        var links = new List<int[]?>(Enumerable.Repeat<int[]?>(null, samples.Count - 1));
        bool complete = true;
        while (true)
        {
            var bad = CheckSegments(samples, links, ref complete);
            if (bad.Count == 0)
            {
                break;
            }

            (samples, links) = Split(samples, links, bad, ref complete);
        }

        return (Align(samples, links), complete);
    }

    private List<TraceSample> InitialSamples(double pStart, double pEnd, int intervals)
    {
        double u0 = warp.ToWarped(pStart), u1 = warp.ToWarped(pEnd);
        var samples = new List<TraceSample>(intervals + 1);
        Complex[]? previous = null;
        for (int i = 0; i <= intervals && budget.Remaining > 0; i++)
        {
            double u = u0 + ((u1 - u0) * i / intervals);
            double p = i == 0 ? pStart : i == intervals ? pEnd : warp.ToValue(u);
            var roots = Solve(p, previous);
            if (roots is not null && budget.TryTake())
            {
                samples.Add(new TraceSample(u, p, roots));
                previous = roots;
            }
        }

        return samples;
    }

    /// <summary>Matches every unchecked segment; returns those that jump too far and can still be split.</summary>
    private List<(int Index, double Excess, int[] Match)> CheckSegments(List<TraceSample> samples, List<int[]?> links, ref bool complete)
    {
        var bad = new List<(int, double, int[])>();
        for (int i = 0; i < links.Count; i++)
        {
            if (links[i] is not null)
            {
                continue;
            }

            var match = new int[degree];
            matcher.Match(samples[i].Roots, samples[i + 1].Roots, match);
            double excess = Excess(samples[i].Roots, samples[i + 1].Roots, match);
            if (excess <= 1.0)
            {
                links[i] = match;
            }
            else if (samples[i + 1].U - samples[i].U <= FinestWarpedStep * Math.Max(1.0, Math.Abs(samples[i].U)))
            {
                links[i] = match;
                complete = false;
            }
            else
            {
                bad.Add((i, excess, match));
            }
        }

        return bad;
    }

    private double Excess(Complex[] a, Complex[] b, int[] match)
    {
        double worst = 0.0;
        for (int k = 0; k < a.Length; k++)
        {
            var next = b[match[k]];
            double allowed = fraction * Math.Max(scale, Math.Min(a[k].Magnitude, next.Magnitude));
            worst = Math.Max(worst, Complex.Abs(next - a[k]) / allowed);
        }

        return worst;
    }

    /// <summary>Inserts a midpoint into each bad segment the budget allows, worst segments first.</summary>
    private (List<TraceSample>, List<int[]?>) Split(
        List<TraceSample> samples, List<int[]?> links, List<(int Index, double Excess, int[] Match)> bad, ref bool complete)
    {
        var (chosen, badMatch) = Choose(bad);
        var nextSamples = new List<TraceSample>(samples.Count + chosen.Count);
        var nextLinks = new List<int[]?>(samples.Count + chosen.Count);
        for (int i = 0; i < samples.Count; i++)
        {
            nextSamples.Add(samples[i]);
            if (i == samples.Count - 1)
            {
                break;
            }

            TraceSample? middle = chosen.Contains(i) && budget.TryTake()
                ? Midpoint(samples[i], samples[i + 1], badMatch[i])
                : null;
            if (middle is null)
            {
                if (badMatch.TryGetValue(i, out var keep))
                {
                    // Budget exhausted or the midpoint could not be solved: keep the segment as it is.
                    complete = false;
                    nextLinks.Add(keep);
                }
                else
                {
                    nextLinks.Add(links[i]);
                }

                continue;
            }

            nextSamples.Add(middle);
            nextLinks.Add(null);
            nextLinks.Add(null);
        }

        return (nextSamples, nextLinks);
    }

    /// <summary>The bad segments the budget allows splitting, worst first, and every bad segment's pairing.</summary>
    private (HashSet<int> Chosen, Dictionary<int, int[]> Matches) Choose(List<(int Index, double Excess, int[] Match)> bad)
    {
        var chosen = new HashSet<int>();
        var matches = new Dictionary<int, int[]>();
        int allowance = budget.Remaining;
        foreach (var (index, _, match) in bad.OrderByDescending(b => b.Excess))
        {
            matches[index] = match;
            if (chosen.Count < allowance)
            {
                chosen.Add(index);
            }
        }

        return (chosen, matches);
    }

    private TraceSample? Midpoint(TraceSample a, TraceSample b, int[] match)
    {
        double u = 0.5 * (a.U + b.U);
        var start = new Complex[degree];
        for (int k = 0; k < degree; k++)
        {
            start[k] = 0.5 * (a.Roots[k] + b.Roots[match[k]]);
        }

        var roots = Solve(warp.ToValue(u), start);
        return roots is null ? null : new TraceSample(u, warp.ToValue(u), roots);
    }

    /// <summary>Roots at p, refined from <paramref name="warmStart"/> when given, else (or on failure) solved afresh.</summary>
    private Complex[]? Solve(double p, Complex[]? warmStart)
    {
        if (coefficients.Fill(p, buffer) != degree)
        {
            return null;
        }

        if (warmStart is not null)
        {
            var z = (Complex[])warmStart.Clone();
            if (TraceRootRefiner.TryRefine(buffer, z, scale))
            {
                return z;
            }
        }

        var roots = new Complex[degree];
        return PolynomialRoots.TryFind(buffer, roots, RootFindingOptions.Default, out int count) && count == degree
            ? roots
            : null;
    }

    /// <summary>Follows the segment pairings from the first sample's order to build index-aligned branches.</summary>
    private ImmutableArray<ImmutableArray<LocusPoint>> Align(List<TraceSample> samples, List<int[]?> links)
    {
        var order = Enumerable.Range(0, degree).ToArray();
        var branches = new ImmutableArray<LocusPoint>.Builder[degree];
        for (int k = 0; k < degree; k++)
        {
            branches[k] = ImmutableArray.CreateBuilder<LocusPoint>(samples.Count);
        }

        for (int i = 0; i < samples.Count; i++)
        {
            for (int k = 0; k < degree; k++)
            {
                branches[k].Add(new LocusPoint(samples[i].P, samples[i].Roots[order[k]]));
                if (i < links.Count)
                {
                    order[k] = links[i]![order[k]];
                }
            }
        }

        return [.. branches.Select(b => b.MoveToImmutable())];
    }
}
