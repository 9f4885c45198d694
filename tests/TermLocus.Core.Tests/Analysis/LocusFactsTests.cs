using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Analysis;

/// <summary>Construction facts of textbook loops K·B(s)/A(s), swept gain K, characteristic A + K·B.</summary>
public class LocusFactsTests
{
    private const double Rel = 1e-9;

    private static void Near(double expected, double actual, double relative) =>
        Assert.InRange(actual, expected - (relative * Math.Max(Math.Abs(expected), 1e-300)),
            expected + (relative * Math.Max(Math.Abs(expected), 1e-300)));

    [Fact]
    public void Three_pole_type_one_loop_matches_the_textbook_construction()
    {
        // Ogata, Modern Control Engineering, 5th ed., Example 6-1 (from memory): G = K/(s(s+1)(s+2)).
        // Book: centroid -1, asymptotes ±60°, 180°; breakaway s = -0.4226 at K = 0.3849; crossing ω = ±√2 at K = 6.
        var facts = LocusFacts.Compute(Loops.Descending([1], [1, 3, 2, 0]), 0, 20);

        var asymptotes = Assert.Single(facts.Asymptotes);
        Assert.Equal(LocusGainSign.Positive, asymptotes.Sign);
        Assert.Equal(-1.0, asymptotes.Centroid, 1e-12);
        Assert.Equal(new[] { 60.0, 180.0, -60.0 }, asymptotes.AnglesDegrees.Select(a => Math.Round(a, 9)));

        // Exact forms by hand: dK/ds = 0 gives 3s² + 6s + 2 = 0, s = -1 + 1/√3, K = 2/(3√3).
        var breakaway = Assert.Single(facts.BreakPoints);
        Assert.Equal(BreakPointKind.Breakaway, breakaway.Kind);
        Near(-1 + (1 / Math.Sqrt(3)), breakaway.Location.Real, Rel);
        Assert.Equal(0.0, breakaway.Location.Imaginary, 1e-12);
        Near(2 / (3 * Math.Sqrt(3)), breakaway.Value, Rel);
        Assert.Equal(-0.4226, breakaway.Location.Real, 1e-4);
        Assert.Equal(0.3849, breakaway.Value, 1e-4);

        var crossing = Assert.Single(facts.AxisCrossings);
        Near(Math.Sqrt(2), crossing.Omega, Rel);
        Near(6.0, crossing.Value, Rel);
        Assert.Equal(AxisCrossingDirection.IntoRightHalfPlane, crossing.Direction);

        var stable = Assert.Single(facts.StableIntervals);
        Assert.Equal(0.0, stable.From, 1e-15);
        Near(6.0, stable.To, Rel);
        Assert.Empty(facts.DepartureAngles);
        Assert.Empty(facts.ArrivalAngles);
    }

    [Fact]
    public void Four_pole_loop_with_a_zero_has_the_textbook_asymptotes_and_crossing()
    {
        // Nise, Control Systems Engineering, 6th ed., Examples 8.3 and 8.5 (from memory):
        // G = K(s+3)/(s(s+1)(s+2)(s+4)); σa = -4/3, θa = 60°, 180°, 300° (= -60°); crossing ±j1.59 at K = 9.65.
        var facts = LocusFacts.Compute(Loops.Descending([1, 3], [1, 7, 14, 8, 0]), 0, 50);

        var asymptotes = Assert.Single(facts.Asymptotes);
        Assert.Equal(-4.0 / 3.0, asymptotes.Centroid, 1e-12);
        Assert.Equal(new[] { 60.0, 180.0, -60.0 }, asymptotes.AnglesDegrees.Select(a => Math.Round(a, 9)));

        // s = jω in s⁴ + 7s³ + 14s² + (8+K)s + 3K: K = 7ω² - 8 and ω⁴ + 7ω² - 24 = 0 (hand calculation).
        double omega2 = (-7 + Math.Sqrt(145)) / 2;
        var crossing = Assert.Single(facts.AxisCrossings);
        Near(Math.Sqrt(omega2), crossing.Omega, Rel);
        Near((7 * omega2) - 8, crossing.Value, Rel);
        Assert.Equal(1.59, crossing.Omega, 0.005);
        Assert.Equal(9.65, crossing.Value, 0.005);
        Near(crossing.Value, Assert.Single(facts.StableIntervals).To, Rel);
    }

    [Fact]
    public void Loop_with_right_half_plane_zeros_has_a_breakaway_and_a_break_in()
    {
        // Nise, Control Systems Engineering, 6th ed., Example 8.4 (from memory): G = K(s-3)(s-5)/((s+1)(s+2));
        // breakaway -1.45, break-in 3.82. Exact: A'B - AB' = 0 gives 11s² - 26s - 61 = 0, s = (13 ± √840)/11.
        var facts = LocusFacts.Compute(Loops.Descending([1, -8, 15], [1, 3, 2]), 0, 100);

        Assert.Equal(2, facts.BreakPoints.Length);
        var (away, into) = (facts.BreakPoints[0], facts.BreakPoints[1]);
        Assert.Equal(BreakPointKind.Breakaway, away.Kind);
        Assert.Equal(BreakPointKind.BreakIn, into.Kind);
        Near((13 - Math.Sqrt(840)) / 11, away.Location.Real, Rel);
        Near((13 + Math.Sqrt(840)) / 11, into.Location.Real, Rel);
        Assert.Equal(-1.45, away.Location.Real, 0.005);
        Assert.Equal(3.82, into.Location.Real, 0.005);

        // K = -A/B at each point, evaluated independently here.
        static double Gain(double s) => -((s * s) + (3 * s) + 2) / ((s * s) - (8 * s) + 15);
        Near(Gain((13 - Math.Sqrt(840)) / 11), away.Value, Rel);
        Near(Gain((13 + Math.Sqrt(840)) / 11), into.Value, Rel);

        // s = jω: Im gives 3 - 8K = 0, so K = 3/8 and ω² = 61/11 (hand calculation).
        var crossing = Assert.Single(facts.AxisCrossings);
        Near(0.375, crossing.Value, Rel);
        Near(Math.Sqrt(61.0 / 11.0), crossing.Omega, Rel);
    }

    [Fact]
    public void Departure_angle_from_a_complex_pole_pair_follows_the_angle_condition()
    {
        // Nise, Control Systems Engineering, 6th ed., Example 8.6 (from memory): G = K(s+2)/((s+3)(s²+2s+2));
        // departure from -1+j1 is -251.6° = 108.4°. Exact: 180° + 45° - atan(1/2) - 90°.
        var facts = LocusFacts.Compute(
            Loops.Descending([1, 2], [.. (Loops.Product([1, 3], [1, 2, 2])).Coefficients.Reverse()]), 0, 50);

        var upper = Assert.Single(facts.DepartureAngles, d => d.At.Imaginary > 0);
        var lower = Assert.Single(facts.DepartureAngles, d => d.At.Imaginary < 0);
        double exact = 135.0 - (Math.Atan(0.5) * 180 / Math.PI);
        Assert.Equal(exact, upper.AngleDegrees, 1e-9);
        Assert.Equal(-exact, lower.AngleDegrees, 1e-9);
        Assert.Equal(108.4, upper.AngleDegrees, 0.05);
        Assert.Equal(LocusGainSign.Positive, upper.Sign);
    }

    [Fact]
    public void Complex_poles_with_one_zero_give_the_circle_locus_facts()
    {
        // Ogata, Modern Control Engineering, 5th ed., Example 6-2 (from memory): G = K(s+2)/(s²+2s+3).
        // Book: departure 145° (144.74°), break-in -3.7320 at K = 5.4641; the complex branches lie on |s+2| = √3.
        var family = Loops.Descending([1, 2], [1, 2, 3]);
        var facts = LocusFacts.Compute(family, 0, 50);

        var departure = Assert.Single(facts.DepartureAngles, d => d.At.Imaginary > 0);
        Assert.Equal(90 + (Math.Atan(Math.Sqrt(2)) * 180 / Math.PI), departure.AngleDegrees, 1e-9);
        Assert.Equal(144.74, departure.AngleDegrees, 0.005);

        var breakIn = Assert.Single(facts.BreakPoints);
        Assert.Equal(BreakPointKind.BreakIn, breakIn.Kind);
        Near(-2 - Math.Sqrt(3), breakIn.Location.Real, Rel);
        Near(2 + (2 * Math.Sqrt(3)), breakIn.Value, Rel);

        var trace = LocusTracer.Trace(family, 0, 50);
        var complexPoints = trace.Branches.SelectMany(b => b.Points).Where(p => Math.Abs(p.Pole.Imaginary) > 1e-6).ToList();
        Assert.NotEmpty(complexPoints);
        Assert.All(complexPoints, p => Assert.Equal(Math.Sqrt(3), Complex.Abs(p.Pole + 2), 1e-9));
    }

    [Fact]
    public void Four_pole_loop_has_real_and_complex_break_points()
    {
        // Ogata, Modern Control Engineering, 5th ed., Chapter 6 example G = K/(s(s+4)(s²+4s+20)) (from memory):
        // centroid -2, asymptotes ±45°, ±135°; break points s = -2 and s = -2 ± j2.4495; departure from -2+j4 is
        // -90°; crossing ω = ±√10 at K = 260. Exact: A' = 4(s+2)(s²+4s+10); K = -A(s): 64 at -2, 100 at -2±j√6.
        var family = Loops.Descending([1], [1, 8, 36, 80, 0]);
        var facts = LocusFacts.Compute(family, 0, 400);

        var asymptotes = Assert.Single(facts.Asymptotes);
        Assert.Equal(-2.0, asymptotes.Centroid, 1e-12);
        Assert.Equal(new[] { -135.0, -45.0, 45.0, 135.0 }, asymptotes.AnglesDegrees.Select(a => Math.Round(a, 9)).Order());

        Assert.Equal(3, facts.BreakPoints.Length);
        Near(-2.0, facts.BreakPoints[0].Location.Real, Rel);
        Near(64.0, facts.BreakPoints[0].Value, Rel);
        Assert.All(facts.BreakPoints.Skip(1), b =>
        {
            Near(100.0, b.Value, Rel);
            Near(-2.0, b.Location.Real, Rel);
            Near(Math.Sqrt(6), Math.Abs(b.Location.Imaginary), Rel);
        });

        var departure = Assert.Single(facts.DepartureAngles, d => d.At.Imaginary > 0);
        Assert.Equal(-90.0, departure.AngleDegrees, 1e-9);

        var crossing = Assert.Single(facts.AxisCrossings);
        Near(Math.Sqrt(10), crossing.Omega, Rel);
        Near(260.0, crossing.Value, Rel);
    }

    [Fact]
    public void Arrival_angle_at_complex_zeros_follows_the_angle_condition()
    {
        // Nise, Control Systems Engineering, 6th ed., Example 8.7 (from memory): G = K(s²-4s+20)/((s+2)(s+4));
        // crossing ±j3.9 at K = 1.5. Arrival at 2+j4 by the angle condition (hand calculation):
        // 180° - 90° + atan(4/4) + atan(4/6) = 168.69°.
        var family = Loops.Descending([1, -4, 20], [1, 6, 8]);
        var facts = LocusFacts.Compute(family, 0, 10);

        var arrival = Assert.Single(facts.ArrivalAngles, a => a.At.Imaginary > 0);
        double exact = 135.0 + (Math.Atan(4.0 / 6.0) * 180 / Math.PI);
        Assert.Equal(exact, arrival.AngleDegrees, 1e-9);

        var crossing = Assert.Single(facts.AxisCrossings);
        Near(1.5, crossing.Value, Rel);
        Near(Math.Sqrt(15.2), crossing.Omega, Rel);
        Assert.Equal(3.9, crossing.Omega, 0.005);

        // Independent check: the traced branch near the zero comes in along that direction.
        var trace = LocusTracer.Trace(family, 0, 1e5);
        var zero = new Complex(2, 4);
        var end = trace.Branches.Select(b => b.Last.Pole).MinBy(p => Complex.Abs(p - zero));
        Assert.Equal(exact, (end - zero).Phase * 180 / Math.PI, 0.5);
    }

    [Fact]
    public void Departure_direction_matches_the_traced_branch()
    {
        // Independent numeric check of the angle condition on Ogata's four-pole loop (above): the first traced step
        // out of -2+j4 heads along -90° (straight down).
        var trace = LocusTracer.Trace(Loops.Descending([1], [1, 8, 36, 80, 0]), 0, 400);
        var branch = trace.Branches.Single(b => Complex.Abs(b.First.Pole - new Complex(-2, 4)) < 1e-9);
        var step = branch.Points[1].Pole - branch.Points[0].Pole;
        Assert.Equal(-90.0, step.Phase * 180 / Math.PI, 1.0);
    }

    [Fact]
    public void Negative_gain_locus_uses_the_zero_degree_rules()
    {
        // Nise, Control Systems Engineering, 6th ed., Section 8.10 positive-feedback systems, system of
        // Example 8.3 (from memory): asymptotes at 0°, 120°, 240° about σa = -4/3.
        var facts = LocusFacts.Compute(Loops.Descending([1, 3], [1, 7, 14, 8, 0]), -10, 20);

        Assert.Equal(2, facts.Asymptotes.Length);
        var negative = Assert.Single(facts.Asymptotes, s => s.Sign == LocusGainSign.Negative);
        Assert.False(negative.Uses180DegreeRule);
        Assert.Equal(-4.0 / 3.0, negative.Centroid, 1e-12);
        Assert.Equal(new[] { 0.0, 120.0, -120.0 }, negative.AnglesDegrees.Select(a => Math.Round(a, 9)));

        // Constant term 3K < 0 for K < 0: never stable there (Routh, necessary condition); 0 is a crossing at the
        // origin because the open-loop pole at s = 0 lies strictly inside the range.
        var stable = Assert.Single(facts.StableIntervals);
        Assert.Equal(0.0, stable.From, 1e-15);
        Assert.Contains(facts.AxisCrossings, c => c.Omega == 0 && c.Value == 0);
    }

    [Fact]
    public void Negative_gain_break_point_is_a_true_double_root()
    {
        // Ogata's K/(s(s+1)(s+2)) (above) for K < 0: 3s² + 6s + 2 = 0 also gives s = -1 - 1/√3 with K = -2/(3√3)
        // (hand calculation); at that K the characteristic polynomial has a double root there.
        var family = Loops.Descending([1], [1, 3, 2, 0]);
        var facts = LocusFacts.Compute(family, -5, 10);

        var negative = Assert.Single(facts.BreakPoints, b => b.Value < 0);
        Near(-1 - (1 / Math.Sqrt(3)), negative.Location.Real, Rel);
        Near(-2 / (3 * Math.Sqrt(3)), negative.Value, Rel);
        var p = family.At(negative.Value);
        Assert.Equal(0.0, p.Evaluate(negative.Location.Real), 1e-12);
        Assert.Equal(0.0, p.Derivative().Evaluate(negative.Location.Real), 1e-9);
    }

    [Fact]
    public void Double_integrator_with_a_zero_breaks_in_at_minus_two()
    {
        // Loop K(s+1)/s², the classic double-integrator-with-zero locus (common practice; e.g. Franklin, Powell &
        // Emami-Naeini, Feedback Control of Dynamic Systems, Ch. 5, from memory): a circle |s+1| = 1 that breaks
        // in at s = -2 with K = 4; the double pole at the origin is itself a break point at K = 0.
        var facts = LocusFacts.Compute(Loops.Descending([1, 1], [1, 0, 0]), 0, 20);

        Assert.Equal(2, facts.BreakPoints.Length);
        Assert.Equal(0.0, facts.BreakPoints[0].Value);
        Assert.Equal(BreakPointKind.Breakaway, facts.BreakPoints[0].Kind);
        Near(-2.0, facts.BreakPoints[1].Location.Real, Rel);
        Near(4.0, facts.BreakPoints[1].Value, Rel);
        Assert.Equal(BreakPointKind.BreakIn, facts.BreakPoints[1].Kind);
        var stable = Assert.Single(facts.StableIntervals);
        Assert.Equal(20.0, stable.To);
    }

    [Fact]
    public void Triple_pole_is_one_break_point_with_three_branches_and_no_departure_angles()
    {
        // K/(s+1)³ (common practice; e.g. Dorf & Bishop, Modern Control Systems, 12th ed., Routh examples, from
        // memory): s³ + 3s² + 3s + 1 + K, Routh gives 3·3 > 1 + K, so the crossing is at K = 8, ω = √3; for K < 0
        // the real pole crosses the origin at K = -1. The asymptotes leave -1 at ±60° and 180°.
        var facts = LocusFacts.Compute(Loops.Descending([1], [1, 3, 3, 1]), -10, 10);

        var triple = Assert.Single(facts.BreakPoints);
        Assert.Equal(3, triple.Meeting);
        Assert.Equal(0.0, triple.Value);
        Assert.Equal(-1.0, triple.Location.Real, 1e-6);
        Assert.Empty(facts.DepartureAngles);
        Assert.Equal(2, facts.AxisCrossings.Length);
        Near(-1.0, facts.AxisCrossings[0].Value, Rel);
        Assert.Equal(0.0, facts.AxisCrossings[0].Omega);
        Near(8.0, facts.AxisCrossings[1].Value, Rel);
        Near(Math.Sqrt(3), facts.AxisCrossings[1].Omega, Rel);
        var stable = Assert.Single(facts.StableIntervals);
        Near(-1.0, stable.From, Rel);
        Near(8.0, stable.To, Rel);
    }

    [Fact]
    public void Open_loop_poles_on_the_axis_cross_it_at_zero_gain_when_the_range_spans_zero()
    {
        // K(s²+4)/((s²+1)(s+1)): s³ + (1+K)s² + s + (1+4K); Routh: 1+K > 0, 1+4K > 0, (1+K) > 1+4K, so the loop
        // is stable for -1/4 < K < 0 only (hand calculation). The poles ±j sit on the axis at K = 0 and cross it
        // there, so K = 0 is listed because it lies inside [-2, 5].
        var a = Loops.Product([1, 0, 1], [1, 1]);
        var family = CharacteristicFamily.FromAffine(new AffineSplit(a, Polynomial.FromDescending(1, 0, 4)));
        var facts = LocusFacts.Compute(family, -2, 5);

        Assert.Contains(facts.AxisCrossings, c => c.Value == 0.0 && Math.Abs(c.Omega - 1) < 1e-9);
        var stable = Assert.Single(facts.StableIntervals);
        Near(-0.25, stable.From, Rel);
        Assert.Equal(0.0, stable.To);
        Assert.True(RouthReference.IsStrictlyStable(family.At(-0.125)));
        Assert.False(RouthReference.IsStrictlyStable(family.At(0.125)));
    }

    [Fact]
    public void A_pole_hidden_at_the_origin_is_never_stable_and_crosses_nothing()
    {
        // K·s/(s(s+1)): the common factor s keeps a pole at the origin for every K, so the constant coefficient is
        // 0 and the loop is never strictly stable (Routh necessary condition, common practice); that pole sitting
        // on every boundary through the origin is not a crossing.
        var family = CharacteristicFamily.FromAffine(new AffineSplit(Polynomial.FromDescending(1, 1, 0), Polynomial.FromDescending(1, 0)));
        var facts = LocusFacts.Compute(family, 0, 5);

        Assert.Empty(facts.StableIntervals);
        Assert.Empty(facts.AxisCrossings);
        Assert.Empty(SpecBoundaries.Find(family, 0, 5, minDamping: 0.5));
    }
}
