using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;

namespace TermLocus.Core.Tests.Hardening;

/// <summary>
/// Numerical edge cases through the root finder and the whole locus chain. Each names what is expected and where
/// the figure comes from. Besides its own check, every case asserts (via <see cref="WholeChain"/>) that no NaN or
/// infinity reaches a trace, the facts, the spec boundaries, the spec check or the pole figures.
/// </summary>
public sealed class NumericalEdgeCaseTests
{
    private const double Eps = 2.220446049250313e-16;

    private static CharacteristicFamily Affine(Polynomial a, Polynomial b) =>
        CharacteristicFamily.FromAffine(new AffineSplit(a, b));

    private static Polynomial Roots(params Complex[] roots) => Polynomial.FromRoots(roots);

    private static Polynomial RealRoots(params double[] roots) => Polynomial.FromRoots(roots.Select(r => new Complex(r, 0)));

    // The tracer cuts a branch heading for infinity at FarLimit × max(scale, the largest pole where poles are of
    // ordinary size); this is that size, taken over values away from every degree drop.
    private static double OrdinarySize(CharacteristicFamily family, LocusTrace trace)
    {
        double span = trace.To - trace.From;
        var away = Enumerable.Range(0, 41).Select(i => trace.From + (span * i / 40.0))
            .Where(v => trace.DegreeDrops.All(d => Math.Abs(v - d) > span / 20.0));
        return away.Select(v => LocusTracer.PolesAt(family, v).Max(Complex.Abs)).Append(trace.Scale).Max();
    }

    [Fact]
    public void An_eightfold_root_is_found_to_about_eps_to_the_one_eighth_and_its_locus_is_finite()
    {
        // A k-fold root under a relative coefficient perturbation δ moves by about (δ·κ)^(1/k) (Wilkinson, Rounding
        // Errors in Algebraic Processes, 1963, ch. 2, from memory); for (s+1)^8, whose coefficients are C(8,j) ≤ 70,
        // κ = Σ C(8,j) = 256, so the spread is near (256·eps)^(1/8) ≈ 0.022. The mean of the eight roots is -a7/(8·a8)
        // = -1 exactly by Vieta (common practice) and is well conditioned.
        var a = Polynomial.FromRoots(Enumerable.Repeat(new Complex(-1, 0), 8));
        var roots = PolynomialRoots.Find(a);

        double expected = Math.Pow(256 * Eps, 1.0 / 8.0);
        Assert.All(roots, r => Assert.True(Complex.Abs(r + 1) <= 3 * expected, $"{r} is {Complex.Abs(r + 1)} from -1"));
        Assert.Equal(-1.0, roots.Aggregate(Complex.Zero, (x, y) => x + y).Real / 8, 1e-12);

        WholeChain.Run(Affine(a, Polynomial.FromDescending(1, 2)), 0.0, 100.0);
    }

    [Fact]
    public void A_tight_cluster_of_poles_keeps_the_chain_finite_and_the_cluster_mean_exact()
    {
        // Poles at -1, -1.001, -1.002, -1.003 (a 1e-3 cluster): each root has condition ~1/Π|gaps| ≈ 1e9, so errors
        // near 1e9·eps ≈ 2e-7 (common practice); the mean -1.0015 again follows from Vieta to 1e-12.
        var a = RealRoots(-1.0, -1.001, -1.002, -1.003);
        var roots = PolynomialRoots.Find(a);
        Assert.Equal(-1.0015, roots.Sum(r => r.Real) / 4, 1e-12);
        Assert.All(roots, r => Assert.True(Math.Abs(r.Real + 1.0015) <= 0.0015 + 1e-5, r.ToString()));

        WholeChain.Run(Affine(a, RealRoots(-2.0)), 0.0, 50.0);
    }

    [Fact]
    public void Coefficients_spanning_1e_minus_9_to_1e9_give_a_finite_locus_with_accurate_poles()
    {
        // Time constants from 1 ms to 1000 s: poles at -1e-3, -1, -1e3 (coefficients 1e-9·… to 1e9 after scaling by
        // 1e9). Each simple pole is well separated, so relative error near eps (common practice): checked to 1e-9.
        var a = RealRoots(-1e-3, -1.0, -1e3).Scale(1e-9 * 1e9);
        var b = Polynomial.FromAscending(1e-9, 1e-9 * 1e3);
        var roots = PolynomialRoots.Find(a);
        double[] expected = [-1e3, -1.0, -1e-3];
        for (int i = 0; i < 3; i++)
        {
            Assert.Equal(expected[i], roots[i].Real, Math.Abs(expected[i]) * 1e-9);
        }

        WholeChain.Run(Affine(Polynomial.FromAscending(1e-9, 1.001, 1001.001, 1.0), b), 0.0, 1e9);
    }

    [Fact]
    public void A_degree_40_loop_gives_a_finite_locus_and_roots_with_tiny_backward_error()
    {
        // Twenty lightly damped pairs at -0.1k ± j·k, k = 1..20: backward error of each root below 1e-12 is what a
        // backward-stable eigenvalue solver gives (Golub & Van Loan, Matrix Computations, 4th ed., §7.5, from memory).
        var poles = Enumerable.Range(1, 20).SelectMany(k => new[] { new Complex(-0.1 * k, k), new Complex(-0.1 * k, -k) });
        var a = Polynomial.FromRoots(poles);
        Assert.Equal(40, a.Degree);
        foreach (var root in PolynomialRoots.Find(a))
        {
            Assert.True(PolynomialRoots.BackwardError(a, root) < 1e-12, $"backward error at {root}");
        }

        WholeChain.Run(Affine(a, RealRoots(-0.5, -1.5)), 0.0, 1e3);
    }

    [Fact]
    public void Wilkinsons_polynomial_gives_a_finite_locus()
    {
        // Π(s - i), i = 1..20 (Wilkinson 1959, "The evaluation of the zeros of ill-conditioned polynomials", from
        // memory): its stored coefficients move the roots near 15 by O(1), but the returned roots must still be those of
        // a polynomial within a few rounding units (backward error below 1e-12), and the whole chain finite.
        var a = RealRoots([.. Enumerable.Range(1, 20).Select(i => (double)i)]);
        foreach (var root in PolynomialRoots.Find(a))
        {
            Assert.True(PolynomialRoots.BackwardError(a, root) < 1e-12, $"backward error at {root}");
        }

        WholeChain.Run(Affine(a, Polynomial.FromDescending(1, 30)), 0.0, 1e20);
    }

    [Fact]
    public void A_leading_coefficient_that_vanishes_inside_the_range_cuts_the_branches_at_the_far_limit()
    {
        // P = A + p·B with lead(A) = 1, lead(B) = -1: at p = 1 the degree drops from 3 to 2 and one pole passes
        // through infinity (common practice; the tracer cuts the branch at FarLimit times the ordinary pole size). Nothing may be NaN, and
        // no traced point may lie past the far limit.
        var a = Polynomial.FromDescending(1, 2, 3, 1);
        var b = Polynomial.FromDescending(-1, 0, 1, 5);
        var (trace, facts, _) = WholeChain.Run(Affine(a, b), 0.0, 3.0);

        Assert.Equal(1.0, Assert.Single(trace.DegreeDrops), 1e-12);
        FiniteResults.CheckWithin(trace, 1.01 * TraceOptions.Default.FarLimit * OrdinarySize(Affine(a, b), trace));
        Assert.True(facts.IsAffine);
    }

    [Fact]
    public void A_leading_coefficient_vanishing_in_a_family_that_is_not_affine_stays_finite()
    {
        // P(s; p) = (1 - p²)·s³ + s² + 2s + 1: the cubic term vanishes at p = ±1 (common practice).
        var family = CharacteristicFamily.FromFunction(p => Polynomial.FromAscending(1, 2, 1, 1 - (p * p)));
        var (trace, _, _) = WholeChain.Run(family, -2.0, 2.0);

        Assert.Equal(2, trace.DegreeDrops.Length);
        FiniteResults.CheckWithin(trace, 1.01 * TraceOptions.Default.FarLimit * OrdinarySize(family, trace));
    }

    [Fact]
    public void An_improper_loop_with_more_zeros_than_poles_gives_a_finite_locus()
    {
        // Loop p·(s+2)(s+3)(s+4)/(s+1): for p != 0 the closed loop has degree 3, at p = 0 only 1, so two poles come in
        // from infinity as p leaves 0 (common practice: the roles of poles and zeros swap for an improper loop).
        var a = RealRoots(-1.0);
        var b = RealRoots(-2.0, -3.0, -4.0);
        var (trace, _, _) = WholeChain.Run(Affine(a, b), -5.0, 5.0);
        Assert.Contains(trace.DegreeDrops, d => d == 0.0);
    }

    [Fact]
    public void A_fixed_pole_zero_cancellation_keeps_its_pole_and_stays_finite()
    {
        // Loop p·(s+1)/((s+1)(s+2)): the cancelled pole at -1 stays a closed-loop pole for every p (plant-file
        // design, "Meaning": common factors are not cancelled).
        var a = RealRoots(-1.0, -2.0);
        var b = RealRoots(-1.0);
        var family = Affine(a, b);
        WholeChain.Run(family, 0.0, 10.0);
        foreach (var p in new[] { 0.0, 1.0, 5.0, 10.0 })
        {
            Assert.Contains(LocusTracer.PolesAt(family, p), s => Complex.Abs(s + 1) < 1e-9);
        }
    }

    [Fact]
    public void A_sweep_across_a_pole_zero_cancellation_stays_finite()
    {
        // P(s; z) = s(s+1)(s+2) + 4(s+z): sweeping the controller zero z across 1 cancels the plant pole at -1 at
        // z = 1, where P = (s+1)(s² + 2s + 4) (common practice; expanded by hand).
        var a = Polynomial.FromDescending(1, 3, 6, 0);
        var b = Polynomial.Constant(4);
        var family = Affine(a, b);
        WholeChain.Run(family, 0.0, 2.0);
        var atOne = LocusTracer.PolesAt(family, 1.0);
        Assert.Contains(atOne, s => Complex.Abs(s + 1) < 1e-9);
        Assert.Contains(atOne, s => Complex.Abs(s - new Complex(-1, Math.Sqrt(3))) < 1e-9);
    }

    [Fact]
    public void A_pole_zero_cancellation_on_the_imaginary_axis_is_not_a_crossing()
    {
        // Loop p·(s² + 1)/((s² + 1)(s + 2)): the poles ±j are cancelled, so they stay closed-loop poles for every p
        // (plant-file design, "Meaning") and never cross the axis; the third pole -2 - p moves left (common practice).
        var a = Polynomial.FromDescending(1, 2, 1, 2);
        var b = Polynomial.FromDescending(1, 0, 1);
        var (_, facts, _) = WholeChain.Run(Affine(a, b), 0.0, 10.0);

        Assert.All(facts.AxisCrossings, c => Assert.True(c.Value == 0.0 || Math.Abs(c.Omega - 1.0) > 1e-6, c.ToString()));
    }
}
