using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Analysis;

/// <summary>Stable intervals (and the numerical path for families not affine in the swept value), cross-checked with
/// the Routh–Hurwitz criterion and closed forms.</summary>
public class StableIntervalTests
{
    private const double Rel = 1e-9;

    private static void Near(double expected, double actual, double relative) =>
        Assert.InRange(actual, expected - (relative * Math.Max(Math.Abs(expected), 1e-300)),
            expected + (relative * Math.Max(Math.Abs(expected), 1e-300)));

    [Fact]
    public void Conditionally_stable_loop_has_two_stable_intervals_confirmed_by_routh()
    {
        // Ogata, Modern Control Engineering, 5th ed., Chapter 6, the conditionally stable system (from memory):
        // G = K(s²+2s+4)/(s(s+4)(s+6)(s²+1.4s+1)) is stable only for limited ranges of K. The book reads the
        // ranges off a plot; here every interval end is checked with the Routh–Hurwitz criterion just inside and
        // just outside (Ogata, Section 5-6).
        var a = Loops.Product([1, 0], [1, 4], [1, 6], [1, 1.4, 1]);
        var b = Polynomial.FromDescending(1, 2, 4);
        var family = CharacteristicFamily.FromAffine(new AffineSplit(a, b));
        var facts = LocusFacts.Compute(family, 0, 300);

        Assert.Equal(2, facts.StableIntervals.Length);
        Assert.Equal(0.0, facts.StableIntervals[0].From, 1e-15);
        AssertRouthAgreesAtEnds(family, facts, 0, 300);
        Assert.Equal(3, facts.AxisCrossings.Length);
        Assert.Equal(AxisCrossingDirection.IntoLeftHalfPlane, facts.AxisCrossings[1].Direction);
    }

    [Fact]
    public void Band_stable_loop_with_a_double_integrator_is_stable_only_between_two_gains()
    {
        // Dorf & Bishop, Modern Control Systems, 12th ed., problem on L = K(s+2.5)(s+3.2)/(s²(s+1)(s+10)(s+30))
        // (from memory): "stable only for k1 < K < k2", to be found with Routh–Hurwitz. Checked here with Routh.
        var a = Loops.Product([1, 0, 0], [1, 1], [1, 10], [1, 30]);
        var b = Loops.Product([1, 2.5], [1, 3.2]);
        var family = CharacteristicFamily.FromAffine(new AffineSplit(a, b));
        var facts = LocusFacts.Compute(family, 0, 1e5);

        var band = Assert.Single(facts.StableIntervals);
        Assert.True(band.From > 0);
        Assert.True(band.To < 1e5);
        AssertRouthAgreesAtEnds(family, facts, 0, 1e5);
    }

    [Fact]
    public void Equal_degree_loop_passes_a_pole_through_infinity()
    {
        // K(s+2)/(s+1): (1+K)s + (1+2K) = 0 has its root s = -(1+2K)/(1+K) stable for K < -1 or K > -1/2 and at
        // infinity for K = -1 (hand calculation, first-order closed form).
        var facts = LocusFacts.Compute(Loops.Descending([1, 2], [1, 1]), -5, 5);

        Assert.Equal(2, facts.StableIntervals.Length);
        Assert.Equal(-5.0, facts.StableIntervals[0].From);
        Assert.Equal(-1.0, facts.StableIntervals[0].To, 1e-15);
        Assert.Equal(-0.5, facts.StableIntervals[1].From, 1e-15);
        Assert.Equal(5.0, facts.StableIntervals[1].To);
        Assert.Empty(facts.Asymptotes);
    }

    [Fact]
    public void Pade_delay_family_is_not_affine_and_its_delay_margin_is_solved_numerically()
    {
        // Loop 2e^{-sτ}/(s+1) with a second-order Padé delay, swept in τ (P is quadratic in τ, so not affine).
        // |L(jω)| = 1 at ω = √3 (the Padé factor is all-pass); the Padé phase 2·atan2(ωτ/2, 1 - (ωτ)²/12) must
        // equal 2π/3 there, which gives ωτ = √15 - √3, τ = √5 - 1 (hand calculation). The exact-delay margin is
        // (π - π/3)/√3 = 1.2092 (common practice: margin = phase margin / crossover frequency); Padé is within 3 %.
        var family = CharacteristicFamily.FromFunction(tau =>
            (Polynomial.FromAscending(1, 1) * Polynomial.FromAscending(1, tau / 2, tau * tau / 12))
            + Polynomial.FromAscending(2, -tau, tau * tau / 6));
        var facts = LocusFacts.Compute(family, 0, 3);

        Assert.False(facts.IsAffine);
        Assert.Empty(facts.Asymptotes);
        Assert.Empty(facts.BreakPoints);
        Assert.Empty(facts.DepartureAngles);
        var crossing = Assert.Single(facts.AxisCrossings);
        Near(Math.Sqrt(5) - 1, crossing.Value, Rel);
        Near(Math.Sqrt(3), crossing.Omega, Rel);
        Assert.Equal(AxisCrossingDirection.IntoRightHalfPlane, crossing.Direction);
        var stable = Assert.Single(facts.StableIntervals);
        Near(Math.Sqrt(5) - 1, stable.To, Rel);
        Assert.Equal(2 * Math.PI / (3 * Math.Sqrt(3)), stable.To, 0.03 * stable.To);
    }

    [Fact]
    public void Gain_entering_squared_gives_symmetric_crossings_and_a_touch_at_zero()
    {
        // Ogata's K/(s(s+1)(s+2)) (above) with K = q²: crossings at q = ±√6; at q = 0 the pole at the origin only
        // touches the axis (it is at -q²/2 + O(q⁴) on both sides), so the stable set is (-√6, 0) ∪ (0, √6).
        var family = CharacteristicFamily.FromFunction(q => Polynomial.FromDescending(1, 3, 2, q * q));
        var facts = LocusFacts.Compute(family, -5, 5);

        Assert.Equal(2, facts.AxisCrossings.Length);
        Near(-Math.Sqrt(6), facts.AxisCrossings[0].Value, Rel);
        Near(Math.Sqrt(6), facts.AxisCrossings[1].Value, Rel);
        Assert.All(facts.AxisCrossings, c => Near(Math.Sqrt(2), c.Omega, Rel));
        Assert.Equal(2, facts.StableIntervals.Length);
        Near(-Math.Sqrt(6), facts.StableIntervals[0].From, Rel);
        Assert.Equal(0.0, facts.StableIntervals[0].To, 1e-7);
        Near(Math.Sqrt(6), facts.StableIntervals[1].To, Rel);
    }

    [Fact]
    public void Non_affine_crossings_agree_with_the_exact_affine_solution()
    {
        // The same loop K(s+3)/(s(s+1)(s+2)(s+4)) of Nise Example 8.5 (above), once as an affine split and once
        // as an opaque function: the numerical path must reproduce the exact crossing to 1e-9.
        var affine = Loops.Descending([1, 3], [1, 7, 14, 8, 0]);
        var opaque = CharacteristicFamily.FromFunction(affine.At);
        var exact = LocusFacts.Compute(affine, 0, 50);
        var scanned = LocusFacts.Compute(opaque, 0, 50);

        Near(exact.AxisCrossings[0].Value, Assert.Single(scanned.AxisCrossings).Value, Rel);
        Near(exact.AxisCrossings[0].Omega, scanned.AxisCrossings[0].Omega, Rel);
        Near(exact.StableIntervals[0].To, Assert.Single(scanned.StableIntervals).To, Rel);
    }

    private static void AssertRouthAgreesAtEnds(CharacteristicFamily family, LocusFacts facts, double from, double to)
    {
        const double probe = 1e-6;
        foreach (var interval in facts.StableIntervals)
        {
            Assert.True(RouthReference.IsStrictlyStable(family.At(0.5 * (interval.From + interval.To))));
            foreach (double end in new[] { interval.From, interval.To })
            {
                if (end == from || end == to)
                {
                    continue;
                }

                double inside = end == interval.From ? end * (1 + probe) : end * (1 - probe);
                double outside = end == interval.From ? end * (1 - probe) : end * (1 + probe);
                Assert.True(RouthReference.IsStrictlyStable(family.At(inside)), $"inside {inside}");
                Assert.False(RouthReference.IsStrictlyStable(family.At(outside)), $"outside {outside}");
            }
        }
    }
}
