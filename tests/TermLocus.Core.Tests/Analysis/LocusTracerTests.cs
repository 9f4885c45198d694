using System.Numerics;
using CsCheck;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Analysis;

public class LocusTracerTests
{
    /// <summary>
    /// Random proper loops: up to 4 real poles and 2 complex pairs, fewer zeros than poles, either sign. Positions
    /// lie on a 1/8 grid, so coincidences are exact (true multiple poles, exact cancellations) rather than
    /// differences of 1e-60 that no loop has and no double-precision solver can resolve.
    /// </summary>
    private static readonly Gen<(double[] Real, (double Re, double Im)[] Pairs, double[] Zeros, bool Negate)> RandomLoops =
        Gen.Select(Eighths(-40, 8).Array[0, 4], Gen.Select(Eighths(-32, 4), Eighths(2, 24)).Array[0, 2],
                Eighths(-48, 16).Array[0, 3], Gen.Bool)
            .Where(t => t.Item1.Length + (2 * t.Item2.Length) >= 1 && t.Item3.Length < t.Item1.Length + (2 * t.Item2.Length));

    private static Gen<double> Eighths(int low, int high) => Gen.Int[low, high].Select(k => k / 8.0);

    private static (AffineSplit Split, Complex[] Poles, Complex[] Zeros) Build(
        (double[] Real, (double Re, double Im)[] Pairs, double[] Zeros, bool Negate) loop)
    {
        var poles = loop.Real.Select(r => new Complex(r, 0))
            .Concat(loop.Pairs.SelectMany(p => new[] { new Complex(p.Re, p.Im), new Complex(p.Re, -p.Im) })).ToArray();
        var zeros = loop.Zeros.Select(z => new Complex(z, 0)).ToArray();
        var b = Polynomial.FromRoots(zeros);
        return (new AffineSplit(Polynomial.FromRoots(poles), loop.Negate ? -b : b), poles, zeros);
    }

    [Fact]
    public void Random_loops_give_one_continuous_branch_per_pole_from_the_open_loop_poles()
    {
        // Root-locus rules (Ogata, Modern Control Engineering, 5th ed., Section 6-2, from memory): n branches, each
        // starting at an open-loop pole (K = 0); no drawn segment longer than the documented step bound.
        RandomLoops.Sample(loop =>
        {
            var (split, poles, _) = Build(loop);
            var family = CharacteristicFamily.FromAffine(split);
            var range = LocusTracer.AutomaticRange(family);
            var trace = LocusTracer.Trace(family, range.Low, range.High);

            Assert.Equal(poles.Length, trace.Branches.Length);
            Assert.True(trace.Complete, Describe(loop));
            AssertSegmentsWithinBound(trace);
            // Each start is a root of A to working accuracy, and together they are A's roots (clusters of close
            // roots are only determined to about 1e-4 relative by any double-precision solver).
            Assert.All(trace.Branches, b => Assert.True(
                split.A.Evaluate(b.First.Pole).Magnitude <= 1e-12 * Magnitudes(split.A, Math.Max(trace.Scale, b.First.Pole.Magnitude)),
                Describe(loop)));
            AssertSameMultiset(poles, trace.Branches.Select(b => b.First.Pole).ToArray(), 1e-3 * trace.Scale, Describe(loop));
            Assert.All(trace.Branches, b => Assert.Equal(0.0, b.First.Value));
        }, iter: 100, threads: 1);
    }

    [Fact]
    public void Random_loops_end_at_the_zeros_or_along_the_asymptotes()
    {
        // Root-locus rules (Ogata, 5th ed., Section 6-2, from memory): as K grows, m branches end at the open-loop
        // zeros and n - m go to infinity along the asymptotes (centroid and (2k+1)·180°/(n-m), or k·360°/(n-m) when
        // the loop gain is negative).
        RandomLoops.Sample(loop =>
        {
            var (split, poles, zeros) = Build(loop);
            var family = CharacteristicFamily.FromAffine(split);
            var facts = LocusFacts.Compute(family, 0, 1);
            // Far beyond the automatic range, so that the poles approaching zeros are close to them whatever n - m.
            var range = LocusTracer.AutomaticRange(family, farFactor: 100);
            var trace = LocusTracer.Trace(family, 0, 1e4 * range.High);
            var ends = trace.Branches.Select(b => b.Last.Pole).ToList();

            double spread = poles.Concat(zeros).Max(p => p.Magnitude) + 1;
            foreach (var zero in zeros)
            {
                var nearest = ends.MinBy(e => Complex.Abs(e - zero));
                Assert.True(Complex.Abs(nearest - zero) < 0.05 * spread, $"no branch ends at zero {zero}: {Describe(loop)}");
                ends.Remove(nearest);
            }

            Assert.Equal(poles.Length - zeros.Length, ends.Count);
            var asymptotes = Assert.Single(facts.Asymptotes);
            foreach (var end in ends)
            {
                var fromCentroid = end - asymptotes.Centroid;
                Assert.True(fromCentroid.Magnitude > 10 * spread / 4, $"end {end} is not far out: {Describe(loop)}");
                double angle = fromCentroid.Phase * 180 / Math.PI;
                double off = asymptotes.AnglesDegrees.Min(a => Math.Abs(LocusAnglesDifference(a, angle)));
                Assert.True(off < 3.0, $"end {end} is {off}° off every asymptote: {Describe(loop)}");
            }
        }, iter: 60, threads: 1);
    }

    [Fact]
    public void Branches_do_not_swap_at_a_breakaway_point()
    {
        // Ogata's K/(s(s+1)(s+2)) (5th ed., Example 6-1, from memory): the poles from 0 and -1 meet at -0.4226 and
        // leave as a complex pair, one above and one below the axis; the pole from -2 stays real.
        var trace = LocusTracer.Trace(Loops.Descending([1], [1, 3, 2, 0]), 0, 20);

        var fromMinusTwo = trace.Branches.Single(b => Math.Abs(b.First.Pole.Real + 2) < 1e-9);
        Assert.All(fromMinusTwo.Points, p => Assert.Equal(0.0, p.Pole.Imaginary, 1e-9));
        foreach (var branch in trace.Branches.Where(b => b != fromMinusTwo))
        {
            var complexPart = branch.Points.Where(p => p.Value > 0.3849 * 1.001).ToList();
            int sign = Math.Sign(complexPart[0].Pole.Imaginary);
            Assert.NotEqual(0, sign);
            Assert.All(complexPart, p => Assert.Equal(sign, Math.Sign(p.Pole.Imaginary)));
        }
    }

    [Fact]
    public void Range_through_zero_traces_negative_and_positive_gains_in_one_branch_each()
    {
        // Same loop over K in [-5, 10]: three branches, continuous through K = 0 where they pass the open-loop
        // poles 0, -1, -2 (common practice: the complementary and ordinary loci join at the poles).
        var family = Loops.Descending([1], [1, 3, 2, 0]);
        var trace = LocusTracer.Trace(family, -5, 10);

        Assert.Equal(3, trace.Branches.Length);
        Assert.True(trace.Complete);
        AssertSegmentsWithinBound(trace);
        foreach (double pole in new[] { 0.0, -1.0, -2.0 })
        {
            var closest = trace.Branches.SelectMany(b => b.Points).MinBy(p => Complex.Abs(p.Pole - pole));
            Assert.Equal(0.0, closest.Value, 1e-2);
        }
    }

    [Fact]
    public void Degree_drop_cuts_branches_at_the_far_limit_and_restarts_them()
    {
        // K(s+2)/(s+1): the root -(1+2K)/(1+K) goes to infinity at K = -1 (hand calculation). The branch before
        // must end and the one after start at the far limit, never at a value where the degree has dropped.
        var trace = LocusTracer.Trace(Loops.Descending([1, 2], [1, 1]), -5, 5);

        Assert.Equal(new[] { -1.0 }, trace.DegreeDrops.ToArray());
        Assert.Equal(2, trace.Branches.Length);
        var (before, after) = (trace.Branches[0], trace.Branches[1]);
        Assert.Equal(LocusBranchEnd.DegreeDrop, before.End);
        Assert.Equal(LocusBranchEnd.DegreeDrop, after.Start);
        Assert.True(before.Last.Value < -1 && after.First.Value > -1);
        // The far limit is FarLimit times the larger of the scale and the pole size at the piece's other end.
        foreach (var (p, other) in new[] { (before.Last, before.First), (after.First, after.Last) })
        {
            double limit = TraceOptions.Default.FarLimit * Math.Max(trace.Scale, other.Pole.Magnitude);
            Assert.InRange(p.Pole.Magnitude, 0.5 * limit, 1.0 * limit);
            Assert.Equal(-(1 + (2 * p.Value)) / (1 + p.Value), p.Pole.Real, 1e-9 * limit);
        }

        Assert.All(trace.Branches.SelectMany(b => b.Points), p => Assert.True(double.IsFinite(p.Pole.Real)));
    }

    [Fact]
    public void Non_affine_family_starting_at_a_degree_drop_is_traced_from_the_far_limit()
    {
        // Second-order Padé delay loop 2e^{-sτ}/(s+1) swept in τ (see StableIntervalTests): at τ = 0 the polynomial is
        // s + 3, so two of its three poles come in from infinity (Padé poles at about -6/τ, common practice).
        var family = CharacteristicFamily.FromFunction(tau =>
            (Polynomial.FromAscending(1, 1) * Polynomial.FromAscending(1, tau / 2, tau * tau / 12))
            + Polynomial.FromAscending(2, -tau, tau * tau / 6));
        var trace = LocusTracer.Trace(family, 0, 3);

        Assert.Equal(3, trace.Branches.Length);
        Assert.Equal(new[] { 0.0 }, trace.DegreeDrops.ToArray());
        Assert.All(trace.Branches, b => Assert.Equal(LocusBranchEnd.DegreeDrop, b.Start));
        Assert.True(trace.Complete);
        AssertSegmentsWithinBound(trace);
        var slow = trace.Branches.Single(b => b.First.Pole.Magnitude < 10);
        Assert.Equal(-3.0, slow.First.Pole.Real, 0.2);
    }

    [Fact]
    public void Value_cap_stops_refinement_and_says_so()
    {
        var options = new TraceOptions(MaxValues: 70, InitialIntervals: 64);
        var trace = LocusTracer.Trace(Loops.Descending([1], [1, 3, 2, 0]), 0, 20, options);

        Assert.False(trace.Complete);
        Assert.InRange(trace.ValueCount, 65, 70);
        Assert.Equal(3, trace.Branches.Length);
    }

    [Fact]
    public void Degree_thirty_loop_is_traced_completely()
    {
        // 15 complex pairs on a ring plus nothing else: 30 branches, all within the step bound.
        var poles = Enumerable.Range(0, 15).SelectMany(k =>
        {
            double angle = Math.PI * (0.55 + (0.4 * k / 14.0));
            var p = Complex.FromPolarCoordinates(1 + (0.1 * k), angle);
            return new[] { p, Complex.Conjugate(p) };
        }).ToArray();
        var family = Loops.FromRoots(poles, [new Complex(-0.5, 0), new Complex(-1.5, 0)]);
        var trace = LocusTracer.Trace(family, 0, LocusTracer.AutomaticRange(family).High);

        Assert.Equal(30, trace.Branches.Length);
        Assert.True(trace.Complete);
        AssertSegmentsWithinBound(trace);
    }

    [Fact]
    public void Poles_at_a_value_are_the_roots_of_the_characteristic_polynomial()
    {
        // K = 6 on K/(s(s+1)(s+2)): poles -3 and ±j√2 (Ogata, 5th ed., Example 6-1, from memory).
        var poles = LocusTracer.PolesAt(Loops.Descending([1], [1, 3, 2, 0]), 6);

        Assert.Equal(3, poles.Length);
        Assert.Equal(-3.0, poles[0].Real, 1e-9);
        Assert.Equal(0.0, poles[1].Real, 1e-9);
        Assert.Equal(Math.Sqrt(2), Math.Abs(poles[1].Imaginary), 1e-9);
    }

    [Fact]
    public void Automatic_range_reaches_past_the_crossing_with_poles_far_along_the_asymptotes()
    {
        // K/(s(s+1)(s+2)): crossing at K = 6 (Ogata, 5th ed., Example 6-1, from memory); spread of the poles about
        // their mean -1 is 1, so with farFactor 5 the far poles sit about 5 from the centroid -1.
        var family = Loops.Descending([1], [1, 3, 2, 0]);
        var range = LocusTracer.AutomaticRange(family);

        Assert.Equal(0.0, range.Low);
        Assert.True(range.High >= 12);
        var far = LocusTracer.PolesAt(family, range.High).Max(p => Complex.Abs(p + 1));
        Assert.InRange(far, 4.0, 6.0);
    }

    [Fact]
    public void Bad_arguments_are_refused()
    {
        var family = Loops.Descending([1], [1, 1]);
        Assert.Throws<ArgumentException>(() => LocusTracer.Trace(family, 1, 1));
        Assert.Throws<ArgumentException>(() => LocusTracer.Trace(family, 0, double.PositiveInfinity));
        Assert.Throws<ArgumentOutOfRangeException>(() => LocusTracer.Trace(family, 0, 1, new TraceOptions(MaxStepFraction: 0)));
        Assert.Throws<ArgumentOutOfRangeException>(() => LocusTracer.Trace(family, 0, 1, new TraceOptions(MaxValues: 10)));
        Assert.Throws<ArgumentOutOfRangeException>(() => LocusTracer.AutomaticRange(family, farFactor: 1));
    }

    private static string Describe((double[] Real, (double Re, double Im)[] Pairs, double[] Zeros, bool Negate) loop) =>
        FormattableString.Invariant(
            $"poles [{string.Join(", ", loop.Real)}] pairs [{string.Join(", ", loop.Pairs)}] zeros [{string.Join(", ", loop.Zeros)}] negate {loop.Negate}");

    /// <summary>Σ|a_k|r^k, the size against which a residual A(s) with |s| &lt;= r is judged.</summary>
    private static double Magnitudes(Polynomial a, double r) =>
        a.Coefficients.Select((c, k) => Math.Abs(c) * Math.Pow(r, k)).Sum();

    private static double LocusAnglesDifference(double a, double b) => Math.IEEERemainder(a - b, 360.0);

    private static void AssertSegmentsWithinBound(LocusTrace trace)
    {
        foreach (var branch in trace.Branches)
        {
            for (int i = 0; i + 1 < branch.Points.Length; i++)
            {
                var (a, b) = (branch.Points[i].Pole, branch.Points[i + 1].Pole);
                Assert.True(Complex.Abs(b - a) <= trace.AllowedStep(a, b) * (1 + 1e-12),
                    $"jump {Complex.Abs(b - a)} at {branch.Points[i].Value}");
                Assert.True(branch.Points[i + 1].Value > branch.Points[i].Value);
            }
        }
    }

    private static void AssertSameMultiset(Complex[] expected, Complex[] actual, double tolerance, string what)
    {
        Assert.Equal(expected.Length, actual.Length);
        var left = actual.ToList();
        foreach (var e in expected)
        {
            // A k-fold root is only determined to about eps^(1/k) (common practice in root finding).
            int k = expected.Count(x => Complex.Abs(x - e) <= 1e-9);
            double allowed = Math.Max(tolerance, 10 * Math.Pow(2.2e-16, 1.0 / k) * Math.Max(1, e.Magnitude));
            var match = left.MinBy(a => Complex.Abs(a - e));
            Assert.True(Complex.Abs(match - e) <= allowed, $"{e} not matched ({match}): {what}");
            left.Remove(match);
        }
    }
}
