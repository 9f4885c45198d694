using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;
using static TermLocus.Core.Tests.Plants.LoopModelTestPlants;

namespace TermLocus.Core.Tests.Analysis;

/// <summary>
/// Unit-circle crossings and stable ranges of sampled loops as the locus study reports them (the facts the z-plane view
/// and <c>analyze</c> print), against textbook critical gains and hand-worked Jury tests.
/// Jury's test for z² + a₁z + a₀ (Ogata, Discrete-Time Control Systems, 2nd ed., §4-3, from memory): stable iff
/// |a₀| &lt; 1, P(1) &gt; 0 and P(−1) &gt; 0; for z³ + a₂z² + a₁z + a₀: |a₀| &lt; 1, P(1) &gt; 0, P(−1) &lt; 0 and
/// |a₀² − 1| &gt; |a₀a₂ − a₁|. A pair meets the circle where the |a₀| (or the last) condition turns to equality,
/// a real root meets z = −1 where P(−1) does.
/// </summary>
public class SampledLocusFactsTests
{
    private static readonly double E1 = Math.Exp(-1.0);

    [Theory]
    [InlineData(0.5, 8.165)]
    [InlineData(1.0, 4.328)]
    [InlineData(2.0, 2.626)]
    public void Integral_controller_on_a_first_order_plant_leaves_the_circle_at_minus_one(double t, double published)
    {
        // Controller K·z/(z − 1) before the held 1/(s + 1): stable for 0 < K < 8.165 (T = 0.5 s), 4.328 (T = 1 s) and
        // 2.626 (T = 2 s), a branch leaving through z = −1 (NPTEL course 108103008, Digital Control, IIT Guwahati,
        // module 5, "Root locus diagram of digital control systems", read). By hand: with a = e^{−T},
        // P = z² + (K(1 − a) − 1 − a)z + a; a₀ = a &lt; 1 always, so the limit is P(−1) = 2(1 + a) − K(1 − a) = 0,
        // K = 2(1 + a)/(1 − a) = 2·coth(T/2).
        var model = Sampled([("K", 1.0)], "1/(s+1)", t, controller: "K*z/(z - 1)");
        var study = Study(model, 12.0);
        double exact = 2.0 / Math.Tanh(t / 2.0);
        Assert.Equal(published, exact, 1e-3);
        var crossing = Assert.Single(study.UnitCircleCrossings);
        Assert.Equal(exact, crossing.Value, 1e-7);
        Assert.Equal(Math.PI, crossing.AngleRadians, 1e-3);
        Assert.Equal(Math.PI / t, crossing.EquivalentFrequency, 1e-3 / t);
        var stable = Assert.Single(study.Facts.StableIntervals);
        Assert.Equal(exact, stable.To, 1e-7);
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(1.0)]
    [InlineData(2.0)]
    public void Motor_loop_pair_meets_the_circle_where_the_constant_term_is_one(double t)
    {
        // K/(s(s + 1)) behind a hold: P = z² + (K(T − 1 + a) − 1 − a)z + a + K(1 − a − Ta), a = e^{−T} (Ogata,
        // Discrete-Time Control Systems, 2nd ed., ch. 3 table and ch. 4, from memory; T = 1 gives the critical gain
        // 2.3922 with the pair at z = 0.2439 ± j0.9698). Jury: a₀ = 1 at K = (1 − a)/(1 − a − Ta), and the pair
        // is then e^{±jθ} with cos θ = −a₁/2. P(−1) stays positive below that gain (worked by hand).
        var model = Sampled([("K", 1.0)], "K/(s*(s+1))", t);
        double a = Math.Exp(-t);
        double critical = (1 - a) / (1 - a - (t * a));
        double cos = -((critical * (t - 1 + a)) - 1 - a) / 2.0;
        var crossing = Assert.Single(Study(model, 3.0 * critical).UnitCircleCrossings);
        Assert.Equal(critical, crossing.Value, 1e-7 * critical);
        Assert.Equal(Math.Acos(cos), crossing.AngleRadians, 1e-6);
        if (t == 1.0)
        {
            Assert.Equal(2.3922, crossing.Value, 1e-4);
            Assert.Equal(0.2439, Math.Cos(crossing.AngleRadians), 1e-4);
            Assert.Equal(0.9698, Math.Sin(crossing.AngleRadians), 1e-4);
        }
    }

    [Fact]
    public void A_negative_gain_pushes_the_integrators_root_out_through_z_equals_one()
    {
        // The motor loop at T = 1 s over K in [−1, 3]. Jury's P(1) &gt; 0 with the coefficients above:
        // P(1) = 1 + a₁ + a₀ = K(T − 1 + a) + K(1 − a − Ta) = K·T(1 − a), positive only for K &gt; 0 (worked by hand). So
        // the stable range is (0, 2.3922): a real root leaves through z = 1 (angle 0, frequency 0) as K falls through 0.
        var model = Sampled([("K", 1.0)], "K/(s*(s+1))", 1.0);
        var study = LocusStudy.Run(model.Family("K", Values()), model.Plane, new Interval(-1.0, 3.0), Specs.None);
        var stable = Assert.Single(study.Facts.StableIntervals);
        Assert.Equal(0.0, stable.From, 1e-9);
        Assert.Equal((Math.E - 1) / (Math.E - 2), stable.To, 1e-7);
        Assert.Equal(2, study.UnitCircleCrossings.Length);
        Assert.Equal(0.0, study.UnitCircleCrossings[0].Value, 1e-9);
        Assert.Equal(0.0, study.UnitCircleCrossings[0].AngleRadians, 1e-6);
        Assert.Equal(0.0, study.UnitCircleCrossings[0].EquivalentFrequency, 1e-6);
    }

    [Fact]
    public void One_sample_of_delay_lowers_the_motor_loops_critical_gain_to_the_cubic_jury_limit()
    {
        // K/(s(s + 1)), T = 1 s, delay T: P = z·(z² − (1 + a)z + a) + K(a·z + b), a = e^{−1}, b = 1 − 2e^{−1}
        // (z^{−1} for the whole sample; hold equivalent as above). Cubic Jury: P(1) = K(1 − a) &gt; 0 and
        // P(−1) = −2(1 + a) + K(b − a) &lt; 0 for all K &gt; 0; |a₀| = Kb &lt; 1 up to 3.78; the binding condition is
        // 1 − a₀² = |a₀a₂ − a₁| = a + K(a + b(1 + a)), i.e. b²K² + (a + b(1 + a))K − (1 − a) = 0, K = 0.8047
        // (worked by hand).
        var model = Sampled([("K", 1.0)], "K/(s*(s+1))", 1.0, delay: 1.0);
        double a = E1, b = 1 - (2 * E1), bb = a + (b * (1 + a));
        double critical = (-bb + Math.Sqrt((bb * bb) + (4 * b * b * (1 - a)))) / (2 * b * b);
        Assert.Equal(0.8047, critical, 1e-4);
        var crossing = Assert.Single(Study(model, 3.0).UnitCircleCrossings);
        Assert.Equal(critical, crossing.Value, 1e-7);
        Assert.InRange(crossing.AngleRadians, 0.1, Math.PI - 0.1); // a complex pair, not a real root
    }

    [Fact]
    public void Half_a_sample_of_delay_uses_the_modified_transform_and_the_quadratic_jury_limit()
    {
        // K/(s + 1), T = 1 s, delay 0.5 s: L = K((1 − e^{−1/2})z + e^{−1/2} − e^{−1}) / (z(z − e^{−1})) (modified
        // z-transform with a hold; Franklin, Powell & Workman, Digital Control of Dynamic Systems, 3rd ed., §4.3.4,
        // from memory). P = z² + (K c₁ − e^{−1})z + K c₀ with c₁ = 1 − e^{−1/2}, c₀ = e^{−1/2} − e^{−1}. Jury:
        // P(1) &gt; 0 always; P(−1) = 1 + e^{−1} − K(c₁ − c₀) &gt; 0 up to K = 8.83; a₀ = K c₀ &lt; 1 up to
        // K = 1/c₀ = 4.1902, where the pair sits at cos θ = −(K c₁ − e^{−1})/2 = −(e^{1/2} − e^{−1})/2 (worked by hand).
        var model = Sampled([("K", 1.0)], "K/(s+1)", 1.0, delay: 0.5);
        double c0 = Math.Exp(-0.5) - E1;
        double critical = 1.0 / c0;
        Assert.Equal(4.1902, critical, 1e-4);
        var crossing = Assert.Single(Study(model, 8.0).UnitCircleCrossings);
        Assert.Equal(critical, crossing.Value, 1e-7 * critical);
        Assert.Equal(Math.Acos(-(Math.Exp(0.5) - E1) / 2.0), crossing.AngleRadians, 1e-6);
    }

    [Theory]
    [InlineData("K/(s*(s+1))", 1.0, 2.0)]
    [InlineData("K/(s*(s+1))", 0.5, 3.0)]
    [InlineData("K/(s*(s+1)*(s+20))", 0.001, 100.0)]
    public void An_integrators_root_on_the_circle_at_the_span_start_starts_the_stable_range_there(string plant, double t, double to)
    {
        // At K = 0 the held integrator leaves its root on the unit circle at z = 1 (1/s sampled: z/(z − 1), common
        // practice); any small K > 0 pulls it inside (the motor loop's P(1) = K·c₀ &gt; 0, Ogata, Discrete-Time Control
        // Systems, 2nd ed., ch. 4, from memory). So the stable range starts at the span start itself, not at a tiny
        // value where the root's move falls below rounding; each span ends below that loop's critical gain.
        var model = Sampled([("K", 1.0)], plant, t);
        var stable = Assert.Single(Study(model, to).Facts.StableIntervals);
        Assert.Equal(0.0, stable.From, 0.0);
        Assert.Equal(to, stable.To, 0.0);
    }

    private static LocusStudy Study(LoopModel model, double to) =>
        LocusStudy.Run(model.Family("K", Values()), model.Plane, new Interval(0.0, to), Specs.None);
}
