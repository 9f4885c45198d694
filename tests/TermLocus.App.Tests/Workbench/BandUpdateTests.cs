using System.Numerics;
using TermLocus.App.Workbench;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Workbench;

public class BandUpdateTests
{
    private const double Tol = 1e-9;

    [Fact]
    public void Opening_varies_the_files_vary_parameter_at_its_nominal_value()
    {
        var varied = BandPlants.Opened(BandPlants.Quadratic()).Session!.Varied;
        Assert.Equal("a", varied.Parameter);
        Assert.Equal(2.0, varied.Value);
        Assert.True(varied.IsNominal);
        Assert.Equal(0.08, varied.Step, Tol); // a tenth of [1.6, 2.4]
    }

    [Fact]
    public void Stepping_the_band_up_moves_the_poles_and_asks_for_the_trace_of_the_new_loop()
    {
        var (state, effects) = Update.Apply(BandPlants.Opened(BandPlants.Quadratic()), Command.StepBandUp);
        var session = state.Session!;
        Assert.Equal(2.08, session.Varied.Value, Tol);
        Assert.Equal(5.0, session.Sweep.Value); // the swept value stays
        // s² + 2.08 s + 5 = 0: s = -1.04 ± j√(5 - 1.0816) (quadratic formula).
        var upper = session.Poles.Poles.Single(p => p.Imaginary > 0);
        Assert.Equal(-1.04, upper.Real, Tol);
        Assert.Equal(Math.Sqrt(5 - 1.0816), upper.Imaginary, Tol);
        var trace = Assert.IsType<TraceLocusEffect>(Assert.Single(effects)); // the band check at K = 5 is still valid
        Assert.Equal(session.Loop.Key, trace.Key);
        Assert.Contains("a=2.08", trace.Key.OtherValues, StringComparison.Ordinal);
        Assert.NotNull(trace.Family);
        Assert.False(state.Unsaved); // the band position is not a chosen value
    }

    [Fact]
    public void The_band_stops_at_its_ends_and_says_so()
    {
        var state = BandPlants.Opened(BandPlants.Quadratic());
        for (int i = 0; i < 5; i++)
        {
            state = Update.Apply(state, Command.StepBandDown).State;
        }

        Assert.Equal(1.6, state.Session!.Varied.Value, Tol);
        var (after, _) = Update.Apply(state, Command.StepBandDown);
        Assert.Equal(1.6, after.Session!.Varied.Value, Tol);
        Assert.Equal("a is at the low end of its band (1.6)", after.Message!.Text);
    }

    [Fact]
    public void Zero_returns_the_varied_parameter_to_nominal_and_reuses_the_cached_trace()
    {
        var opened = BandPlants.Opened(BandPlants.Quadratic());
        var nominalLocus = new LocusAnalysis(opened.Session!.Loaded.NominalKey, [TestPlants.RealBranch(0, 1, 0, -1)], []);
        var traced = Update.Receive(opened, new LocusTraced(nominalLocus)).State;
        var stepped = TestPlants.Run(traced, Command.StepBandUp, Command.StepBandUp).State;
        Assert.False(stepped.Session!.LocusIsCurrent); // the nominal locus stays on screen while tracing
        Assert.Same(nominalLocus, stepped.Session.Locus);
        var (back, effects) = Update.Apply(stepped, Command.BandToNominal);
        Assert.Empty(effects);
        Assert.NotNull(back.Session!.Check); // the check does not depend on the band position
        Assert.True(back.Session!.Varied.IsNominal);
        Assert.True(back.Session.LocusIsCurrent);
        Assert.Equal("a back to nominal (2)", back.Message!.Text);
    }

    [Fact]
    public void V_varies_the_next_toleranced_parameter_and_puts_the_last_one_back_to_nominal()
    {
        var stepped = TestPlants.Run(BandPlants.Opened(BandPlants.Quadratic()), Command.StepBandUp).State;
        var (state, _) = Update.Apply(stepped, Command.NextVariedParameter);
        Assert.Equal("b", state.Session!.Varied.Parameter);
        Assert.True(state.Session.Varied.IsNominal);
        Assert.True(state.Session.Loop.Values.SequenceEqual(state.Session.Loaded.Plant.NominalValues()));
        Assert.Equal("a", Update.Apply(state, Command.NextVariedParameter).State.Session!.Varied.Parameter);
    }

    [Fact]
    public void A_plant_without_a_toleranced_parameter_says_there_is_nothing_to_step()
    {
        var (state, effects) = Update.Apply(TestPlants.Opened(), Command.StepBandUp);
        Assert.Empty(effects);
        Assert.StartsWith("no toleranced parameter besides K", state.Message!.Text, StringComparison.Ordinal);
    }

    [Fact]
    public void Stepping_the_swept_value_does_not_ask_again_for_a_trace_already_asked_for()
    {
        var (_, effects) = Update.Apply(BandPlants.Opened(BandPlants.Quadratic()), Command.StepSweepUp);
        Assert.DoesNotContain(effects, e => e is TraceLocusEffect);
        Assert.Equal(5.2, Assert.IsType<CheckBandEffect>(Assert.Single(effects)).SweptValue);
    }

    [Fact]
    public void Band_stops_are_the_tenths_of_the_band_and_the_nominal_value()
    {
        // Nominal 0.42 lies between the tenths 0.405 and 0.44 of [0.3, 0.65]: it is a stop of its own.
        var varied = new VariedPosition("J", string.Empty, 0.42, new Interval(0.3, 0.65), 0.42);
        Assert.Equal(0.44, varied.Next(+1), Tol);
        Assert.Equal(0.405, varied.Next(-1), Tol);
        Assert.Equal(0.42, (varied with { Value = 0.405 }).Next(+1), Tol);
        Assert.Equal(0.65, (varied with { Value = 0.615 }).Next(+1), Tol);
        Assert.Equal(0.65, (varied with { Value = 0.65 }).Next(+1), Tol);
    }
}
