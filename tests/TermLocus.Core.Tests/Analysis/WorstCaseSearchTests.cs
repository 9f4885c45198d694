using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Analysis;

public class WorstCaseSearchTests
{
    private static double LowestDamping(IReadOnlyList<Complex> poles) =>
        poles.Min(p => PoleMetrics.Of(p).Damping ?? 0.0);

    [Fact]
    public void Worst_damping_of_a_mass_spring_damper_band_is_at_the_closed_form_corner()
    {
        // m s^2 + c s + k: zeta = c / (2 sqrt(k m)) (common practice: standard second-order form).
        // Lowest zeta at c low, k high, m high.
        var box = new ToleranceBox([
            new ToleranceAxis("m", 2.0, new Interval(1.8, 2.2)),
            new ToleranceAxis("c", 3.0, new Interval(2.4, 3.6)),
            new ToleranceAxis("k", 50.0, new Interval(45.0, 55.0)),
        ]);
        var values = ImmutableDictionary<string, double>.Empty.Add("m", 2.0).Add("c", 3.0).Add("k", 50.0);
        Complex[] PolesAt(IReadOnlyDictionary<string, double> v) =>
            PolynomialRoots.Find(Polynomial.FromAscending(v["k"], v["c"], v["m"]));

        var corners = WorstCaseSearch.EvaluateCorners(box, values, PolesAt);
        var worst = WorstCaseSearch.Minimize(box, values, corners, LowestDamping, PolesAt);

        double expected = 2.4 / (2.0 * Math.Sqrt(55.0 * 2.2));
        Assert.Equal(8, corners.Length);
        Assert.Equal(expected, worst.Value, 1e-12);
        Assert.Equal(2.4, worst.At.Toleranced["c"]);
        Assert.Equal(55.0, worst.At.Toleranced["k"]);
        Assert.Equal(2.2, worst.At.Toleranced["m"]);
        Assert.True(worst.At.IsCorner);
    }

    [Fact]
    public void An_interior_minimum_is_found_when_the_figure_is_not_monotone_along_an_axis()
    {
        // s^2 + 2*zeta(q)*s + 1 with zeta(q) = (q - 1)^2 + 0.3 (constructed: omega_n = 1, so the pole damping is zeta(q)).
        // The lowest damping over q in [0, 2] is 0.3 at q = 1, inside the band; both corners give 1.3.
        var box = new ToleranceBox([new ToleranceAxis("q", 0.5, new Interval(0.0, 2.0))]);
        var values = ImmutableDictionary<string, double>.Empty.Add("q", 0.5);
        Complex[] PolesAt(IReadOnlyDictionary<string, double> v)
        {
            double zeta = Math.Pow(v["q"] - 1.0, 2) + 0.3;
            return PolynomialRoots.Find(Polynomial.FromAscending(1.0, 2.0 * zeta, 1.0));
        }

        var corners = WorstCaseSearch.EvaluateCorners(box, values, PolesAt);
        var worst = WorstCaseSearch.Minimize(box, values, corners, LowestDamping, PolesAt);

        Assert.Equal(0.3, worst.Value, 1e-9);
        Assert.Equal(1.0, worst.At.Toleranced["q"], 1e-4);
        Assert.False(worst.At.IsCorner);
    }

    [Fact]
    public void A_box_without_axes_has_the_nominal_point_as_its_only_corner()
    {
        var box = new ToleranceBox([]);
        var corners = WorstCaseSearch.EvaluateCorners(
            box, ImmutableDictionary<string, double>.Empty, _ => PolynomialRoots.Find(Polynomial.FromAscending(2, 3, 1)));
        Assert.Single(corners);
        Assert.Empty(corners[0].Toleranced);
    }
}
