using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Analysis;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Tests.Hardening;

/// <summary>
/// A characteristic polynomial that is identically zero at one swept value (every s is a "root" there). Expected
/// (common practice): the value is treated like a degree drop by the tracer and the facts, nothing there is called a
/// crossing, the poles at that value are refused with a clear error, and a plant file whose nominal values land on
/// it gets a located error.
/// </summary>
public sealed class ZeroPolynomialTests
{
    // P(s; p) = (1 - p)(s + 1): the only pole is -1 for every p != 1; at p = 1 there is no polynomial at all.
    private static readonly CharacteristicFamily Family = CharacteristicFamily.FromAffine(new AffineSplit(
        Polynomial.FromAscending(1, 1), Polynomial.FromAscending(-1, -1)));

    [Fact]
    public void The_tracer_cuts_at_the_value_and_keeps_the_fixed_pole_elsewhere()
    {
        var (trace, _, _) = WholeChain.Run(Family, 0.0, 2.0);

        Assert.Equal(1.0, Assert.Single(trace.DegreeDrops));
        Assert.All(trace.Branches.SelectMany(b => b.Points), p => Assert.True(Complex.Abs(p.Pole + 1) < 1e-9, p.ToString()));
    }

    [Fact]
    public void No_axis_crossing_is_reported_where_the_polynomial_vanishes()
    {
        // The pole stays at -1: it never reaches the imaginary axis, so there is no crossing, and the loop is stable
        // on both sides of p = 1.
        var facts = LocusFacts.Compute(Family, 0.0, 2.0);

        Assert.Empty(facts.AxisCrossings);
        Assert.Equal(2, facts.StableIntervals.Length);
    }

    [Fact]
    public void The_poles_at_that_value_are_refused_with_a_clear_error()
    {
        var e = Assert.Throws<ArgumentException>(() => LocusTracer.PolesAt(Family, 1.0));
        Assert.Contains("zero polynomial", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_plant_file_whose_nominal_value_lands_on_it_gets_a_located_error()
    {
        const string text = """
            # Invented example for a test: a characteristic that vanishes at Kp = 1.
            [parameters]
            Kp = { value = 1.0, range = [0.0, 2.0] }

            [loop]
            characteristic = "(1 - Kp)*(s + 1)"
            sweep = "Kp"
            """;
        var model = LoopModel.Create(PlantFileReader.Parse(text, "vanishing.toml"));

        var error = Assert.Throws<PlantFileException>(() => model.Characteristic(new Dictionary<string, double>())).Error;

        Assert.Equal(new SourcePosition(6, 19), error.Position);
        Assert.Contains("identically zero", error.Message, StringComparison.Ordinal);
        var family = model.Family("Kp", new Dictionary<string, double>());
        Assert.Empty(LocusFacts.Compute(family, 0.0, 2.0).AxisCrossings);
    }
}
