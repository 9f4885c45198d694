using TermLocus.Core.Plants;
using static TermLocus.Core.Tests.Plants.LoopModelTestPlants;

namespace TermLocus.Core.Tests.Plants;

public class LoopModelErrorTests
{
    private static PlantFileError CreateError(Plant plant) =>
        Assert.Throws<PlantFileException>(() => LoopModel.Create(plant)).Error;

    [Fact]
    public void An_unknown_name_is_reported_where_it_stands_with_a_suggestion()
    {
        var e = CreateError(Loop([("Kc", 1.0), ("tau", 0.1)], plant: "1/(tau*s + 1)", controller: "Kx*(s+1)"));
        Assert.Equal("loop.toml", e.File);
        Assert.Equal(new SourcePosition(1, 1), e.Position);
        Assert.Equal("unknown parameter 'Kx': it is not in [parameters]; did you mean 'Kc'?", e.Message);
    }

    [Fact]
    public void An_unknown_name_far_from_every_parameter_gets_no_suggestion()
    {
        var e = CreateError(Loop([("K", 1.0)], plant: "K/(s + damping)"));
        Assert.Equal("unknown parameter 'damping': it is not in [parameters]", e.Message);
        Assert.Equal(new SourcePosition(1, 8), e.Position);
    }

    [Fact]
    public void A_syntax_error_in_the_sensor_carries_the_file_name()
    {
        var e = CreateError(Loop([("K", 1.0)], plant: "K/(s+1)", sensor: "2s"));
        Assert.Equal("loop.toml:1:2: error: missing '*': multiplication must be written out, write 2*s", e.ToString());
    }

    [Fact]
    public void A_characteristic_with_s_in_a_divisor_is_refused_at_load()
    {
        var e = CreateError(Loop([("K", 1.0)], plant: null, characteristic: "s^2 + K/(s+1)"));
        Assert.Contains("the characteristic must be a polynomial in s", e.Message, StringComparison.Ordinal);
        Assert.Equal(new SourcePosition(1, 9), e.Position);
    }

    [Fact]
    public void A_loop_above_the_degree_cap_is_refused_at_load()
    {
        var e = CreateError(Loop([("K", 1.0)], plant: "K/(s+2)^10", controller: "(s+1)^150", sensor: "(s+3)^60"));
        Assert.Contains("degree too high", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Giving_both_or_neither_of_plant_and_characteristic_is_an_argument_error()
    {
        Assert.Throws<ArgumentException>(() => LoopModel.Create(Loop([("K", 1.0)], plant: "K", characteristic: "s+K")));
        Assert.Throws<ArgumentException>(() => LoopModel.Create(Loop([("K", 1.0)], plant: null)));
    }

    [Fact]
    public void A_characteristic_that_vanishes_is_a_located_error()
    {
        // Positive feedback with C·G·H = 1 gives 1 - 1 = 0: no polynomial, no poles.
        var model = Model([("K", 1.0)], plant: "K", feedback: FeedbackSign.Positive);
        Assert.False(model.TryCharacteristic(Values(), out _, out var error));
        Assert.Contains("identically zero", error.Message, StringComparison.Ordinal);
        Assert.True(model.TryCharacteristic(Values(("K", 2.0)), out var p, out _));
        Assert.Equal(-1.0, p[0], 0.0);
    }

    [Fact]
    public void A_division_by_zero_at_the_given_values_is_located_in_its_expression()
    {
        var model = Model([("K", 1.0), ("J", 0.0)], plant: "K/J/s");
        var e = Assert.Throws<PlantFileException>(() => model.Characteristic(Values())).Error;
        Assert.Equal(new SourcePosition(1, 3), e.Position);
        Assert.Contains("division by zero: 'J' is 0", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Values_for_unknown_names_or_not_finite_are_argument_errors()
    {
        var model = Model([("K", 1.0)], plant: "K/(s+1)");
        Assert.Throws<ArgumentException>(() => model.Characteristic(Values(("Q", 1.0))));
        Assert.Throws<ArgumentException>(() => model.Characteristic(Values(("K", double.NaN))));
        Assert.Throws<ArgumentException>(() => model.Characteristic(Values(("K", double.PositiveInfinity))));
    }
}
