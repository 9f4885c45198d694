using System.Numerics;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Analysis;

public class SpecBoundariesTests
{
    private const double Rel = 1e-9;

    /// <summary>K/(s(s+2)): s² + 2s + K, poles -1 ± √(1-K) (real for K &lt; 1), -1 ± j√(K-1) above (common practice).</summary>
    private static readonly CharacteristicFamily SecondOrder = Loops.Descending([1], [1, 2, 0]);

    private static void Near(double expected, double actual) =>
        Assert.InRange(actual, expected - (Rel * Math.Abs(expected)), expected + (Rel * Math.Abs(expected)));

    [Fact]
    public void Damping_line_is_crossed_where_one_over_root_k_equals_zeta()
    {
        // Second-order closed form (Ogata, Modern Control Engineering, 5th ed., Section 5-3, from memory):
        // s² + 2ζωn s + ωn² with ωn = √K and ζωn = 1, so ζ = 1/√K; ζ = 0.6 at K = 1/0.36.
        var found = SpecBoundaries.Find(SecondOrder, 0, 10, minDamping: 0.6);

        var boundary = Assert.Single(found);
        Assert.Equal(SpecBoundaryKind.MinDamping, boundary.Spec);
        Near(1 / 0.36, boundary.Value);
        Assert.False(boundary.PoleMeetsLimitAfter);
        Assert.Equal(-1.0, boundary.Pole.Real, 1e-9);
        Assert.Equal(Math.Sqrt((1 / 0.36) - 1), boundary.Pole.Imaginary, 1e-9);
        Assert.Equal(2, boundary.Poles.Length);
    }

    [Fact]
    public void Decay_rate_and_natural_frequency_limits_are_met_at_the_closed_form_gains()
    {
        // Same loop: the slow real pole -1 + √(1-K) reaches σ = 0.5 (and |s| = 0.5) at K = 0.75; the complex pair
        // has |s| = √K, so ωn = 2 at K = 4 (hand calculation).
        var found = SpecBoundaries.Find(SecondOrder, 0, 10, minDecayRate: 0.5, minNaturalFrequency: 0.5,
            maxNaturalFrequency: 2.0);

        Assert.Equal(3, found.Length);
        var decay = Assert.Single(found, b => b.Spec == SpecBoundaryKind.MinDecayRate);
        Near(0.75, decay.Value);
        Assert.True(decay.PoleMeetsLimitAfter);
        Assert.Equal(-0.5, decay.Pole.Real, 1e-9);
        var slowest = Assert.Single(found, b => b.Spec == SpecBoundaryKind.MinNaturalFrequency);
        Near(0.75, slowest.Value);
        var fastest = Assert.Single(found, b => b.Spec == SpecBoundaryKind.MaxNaturalFrequency);
        Near(4.0, fastest.Value);
        Assert.Equal(2.0, fastest.Pole.Magnitude, 1e-9);
        Assert.False(fastest.PoleMeetsLimitAfter);
    }

    [Fact]
    public void Damping_boundary_of_a_loop_with_complex_zeros_matches_the_quadratic_formula()
    {
        // Nise, Control Systems Engineering, 6th ed., Example 8.7 (from memory): G = K(s²-4s+20)/((s+2)(s+4)),
        // find where the locus crosses ζ = 0.45. Characteristic (1+K)s² + (6-4K)s + (8+20K); ζ = 0.45 gives
        // (6-4K)² = 0.81(1+K)(8+20K), i.e. 0.2K² + 70.68K - 29.52 = 0 (hand calculation); the book's K is 0.417.
        var family = Loops.Descending([1, -4, 20], [1, 6, 8]);
        var found = SpecBoundaries.Find(family, 0, 1.5, minDamping: 0.45);

        double k = (-70.68 + Math.Sqrt((70.68 * 70.68) + (4 * 0.2 * 29.52))) / (2 * 0.2);
        var boundary = Assert.Single(found);
        Near(k, boundary.Value);
        Assert.Equal(0.417, boundary.Value, 0.0005);
        double zeta = -boundary.Pole.Real / boundary.Pole.Magnitude;
        Assert.Equal(0.45, zeta, 1e-9);
    }

    [Fact]
    public void Every_crossing_is_reported_not_only_the_worst_pole()
    {
        // Ogata's K/(s(s+1)(s+2)) (5th ed., Example 6-1, from memory) against σ = 0.2: the pole from 0 meets it
        // when -0.2 is a root, K = 0.2·0.8·1.8 = 0.288; the complex pair leaves it again where its real part is
        // -0.2, i.e. the third pole is -2.6 (sum of poles is -3), K = 2.6·(0.2² + ω²) with 2.6·0.4 + 0.04 + ω² = 2
        // (hand calculation from the coefficients).
        var family = Loops.Descending([1], [1, 3, 2, 0]);
        var found = SpecBoundaries.Find(family, 0, 20, minDecayRate: 0.2);

        Assert.Equal(2, found.Length);
        Near(0.2 * 0.8 * 1.8, found[0].Value);
        Assert.True(found[0].PoleMeetsLimitAfter);
        double omega2 = 2 - 0.04 - (2.6 * 0.4);
        Near(2.6 * (0.04 + omega2), found[1].Value);
        Assert.False(found[1].PoleMeetsLimitAfter);
        Assert.Equal(Math.Sqrt(omega2), found[1].Pole.Imaginary, 1e-9);
    }

    [Fact]
    public void An_existing_trace_can_be_reused()
    {
        var trace = LocusTracer.Trace(SecondOrder, 0, 10);
        var again = SpecBoundaries.Find(SecondOrder, trace, minDamping: 0.6);
        Near(1 / 0.36, Assert.Single(again).Value);
    }

    [Fact]
    public void Limits_out_of_range_are_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => SpecBoundaries.Find(SecondOrder, 0, 1, minDamping: 1.5));
        Assert.Throws<ArgumentOutOfRangeException>(() => SpecBoundaries.Find(SecondOrder, 0, 1, maxNaturalFrequency: -1));
        Assert.Throws<ArgumentOutOfRangeException>(() => SpecBoundaries.Find(SecondOrder, 0, 1, minDecayRate: double.NaN));
    }

    [Fact]
    public void A_real_pole_through_the_origin_is_no_damping_boundary_but_still_a_decay_rate_one()
    {
        // K/((s − 1)(s + 3)): s² + 2s + (K − 3), poles −1 ± √(4 − K) (common practice). A real pole passes through
        // the origin at K = 3 (the stability crossing, where ζ is undefined); above K = 4 the pair −1 ± j√(K − 4) has
        // ωn² = K − 3 and ζωn = 1, so ζ = 1/√(K − 3) = 0.5 at K = 7 (Ogata, 5th ed., Section 5-3, from memory).
        var family = Loops.Descending([1], [1, 2, -3]);

        var damping = Assert.Single(SpecBoundaries.Find(family, 0, 10, minDamping: 0.5));
        Near(7.0, damping.Value);

        var decay = Assert.Single(SpecBoundaries.Find(family, 0, 10, minDecayRate: 0.0));
        Near(3.0, decay.Value);
        Assert.True(decay.PoleMeetsLimitAfter);
    }

    [Fact]
    public void A_pole_leaving_the_origin_at_the_span_start_is_no_damping_boundary()
    {
        // The conveyor demo's PI loop at its nominal values: K·1.2(s + 8) / (s(0.42 s + 0.08)(0.004 s + 1)); at K = 0
        // a pole sits at the origin (ζ undefined there). The ζ = 0.5 crossings that remain are those of the complex
        // pair, which MathNet's roots of the characteristic polynomial confirm: ζ of the least damped pair is 0.5.
        var family = Loops.Descending([1.2, 9.6], [0.00168, 0.42032, 0.08, 0]);

        var found = SpecBoundaries.Find(family, 0, 150, minDamping: 0.5);

        Assert.NotEmpty(found);
        Assert.All(found, b => Assert.True(b.Value > 1e-6, $"boundary at K = {b.Value}"));
        foreach (var b in found)
        {
            double zeta = LeastDamping(family.At(b.Value));
            Assert.Equal(0.5, zeta, 1e-6);
        }
    }

    // ζ of the least damped complex root, from MathNet's polynomial roots (companion-matrix eigenvalues).
    private static double LeastDamping(TermLocus.Core.Algebra.Polynomial p)
    {
        var roots = new MathNet.Numerics.Polynomial(p.Coefficients.ToArray()).Roots();
        return roots.Where(r => Math.Abs(r.Imaginary) > 1e-9).Min(r => -r.Real / r.Magnitude);
    }
}
