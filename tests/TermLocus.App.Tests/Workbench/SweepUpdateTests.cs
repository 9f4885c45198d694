using System.Numerics;
using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class SweepUpdateTests
{
    private const double Tol = 1e-9;

    [Fact]
    public void Opening_starts_at_the_files_value_with_a_hundredth_of_the_range_as_step()
    {
        var sweep = TestPlants.Opened().Session!.Sweep;
        Assert.Equal(5.0, sweep.Value, Tol);
        Assert.Equal(0.2, sweep.Step, Tol); // 20 / 100 on the 1-2-5 series
        Assert.False(sweep.Unsaved);
    }

    [Fact]
    public void Stepping_up_recomputes_the_poles_and_keeps_the_trace()
    {
        var traced = TestPlants.Traced();
        var (state, effects) = Update.Apply(traced, Command.StepSweepUp);
        var session = state.Session!;
        Assert.Empty(effects);
        Assert.Equal(5.2, session.Sweep.Value, Tol);
        Assert.Same(traced.Session!.Locus, session.Locus);
        // s² + 2s + 5.2 = 0 gives s = -1 ± j√4.2 (quadratic formula).
        var upper = session.Poles.Poles.Single(p => p.Imaginary > 0);
        Assert.Equal(-1.0, upper.Real, 1e-9);
        Assert.Equal(Math.Sqrt(4.2), upper.Imaginary, 1e-9);
        Assert.True(state.Unsaved);
    }

    [Fact]
    public void Stepping_down_lands_on_the_grid_of_the_step()
    {
        var state = TestPlants.Run(TestPlants.Opened(), Command.StepSweepDown).State;
        Assert.Equal(4.8, state.Session!.Sweep.Value);
    }

    [Fact]
    public void An_off_grid_value_steps_to_the_neighbouring_grid_points()
    {
        var opened = TestPlants.Opened(TestPlants.SecondOrder(k: 5.03));
        Assert.Equal(5.2, TestPlants.Run(opened, Command.StepSweepUp).State.Session!.Sweep.Value);
        Assert.Equal(5.0, TestPlants.Run(opened, Command.StepSweepDown).State.Session!.Sweep.Value);
    }

    [Fact]
    public void Stepping_past_the_end_of_the_range_stops_there_and_says_so()
    {
        var atEnd = TestPlants.Run(TestPlants.Opened(), Command.JumpToRangeEnd).State;
        Assert.Equal(20.0, atEnd.Session!.Sweep.Value);
        var (state, _) = Update.Apply(atEnd, Command.StepSweepUp);
        Assert.Equal(20.0, state.Session!.Sweep.Value);
        Assert.Equal("at the end of the range of K (20)", state.Message!.Text);
    }

    [Fact]
    public void Range_start_gives_the_open_loop_poles()
    {
        var state = TestPlants.Run(TestPlants.Opened(), Command.JumpToRangeStart).State;
        Assert.Equal(0.0, state.Session!.Sweep.Value);
        var poles = state.Session.Poles.Poles.OrderBy(p => p.Real).ToList();
        Assert.Equal(-2.0, poles[0].Real, 1e-9);
        Assert.Equal(0.0, poles[1].Magnitude, 1e-9);
    }

    [Fact]
    public void Finer_and_coarser_walk_the_1_2_5_series_within_limits()
    {
        var opened = TestPlants.Opened();
        Assert.Equal(0.1, TestPlants.Run(opened, Command.FinerStep).State.Session!.Sweep.Step);
        Assert.Equal(0.05, TestPlants.Run(opened, Command.FinerStep, Command.FinerStep).State.Session!.Sweep.Step);
        Assert.Equal(0.5, TestPlants.Run(opened, Command.CoarserStep).State.Session!.Sweep.Step);
        Assert.Equal(1.0, TestPlants.Run(opened, Command.CoarserStep, Command.CoarserStep).State.Session!.Sweep.Step);
        // Half the range (10) is the coarsest step.
        var coarsest = TestPlants.Run(opened, Enumerable.Repeat(Command.CoarserStep, 10).ToArray()).State;
        Assert.Equal(10.0, coarsest.Session!.Sweep.Step);
        Assert.Equal("this is the coarsest step", coarsest.Message!.Text);
    }

    [Fact]
    public void Finer_steps_then_stepping_stays_free_of_binary_dust()
    {
        var state = TestPlants.Run(TestPlants.Opened(), Command.FinerStep, Command.FinerStep, Command.StepSweepUp, Command.StepSweepUp, Command.StepSweepUp).State;
        Assert.Equal(5.15, state.Session!.Sweep.Value);
    }

    [Fact]
    public void Revert_goes_back_to_the_saved_value()
    {
        var (state, _) = Update.Apply(TestPlants.Run(TestPlants.Opened(), Command.StepSweepUp).State, Command.RevertToSavedValue);
        Assert.Equal(5.0, state.Session!.Sweep.Value);
        Assert.False(state.Unsaved);
        Assert.Equal("back to the saved value K = 5", state.Message!.Text);
    }

    [Fact]
    public void Next_and_previous_boundary_jump_to_the_marks_of_the_trace()
    {
        var traced = TestPlants.Traced(
            new SweepMark(2.5, SweepMarkKind.SpecBoundary, "min_damping"),
            new SweepMark(12.0, SweepMarkKind.StabilityCrossing, null));
        var next = Update.Apply(traced, Command.JumpToNextBoundary).State;
        Assert.Equal(12.0, next.Session!.Sweep.Value);
        Assert.Equal("stability crossing (a pole on the imaginary axis) at K = 12", next.Message!.Text);
        var previous = Update.Apply(traced, Command.JumpToPreviousBoundary).State;
        Assert.Equal(2.5, previous.Session!.Sweep.Value);
        Assert.Equal("min_damping boundary at K = 2.5", previous.Message!.Text);
        var beyond = Update.Apply(next, Command.JumpToNextBoundary).State;
        Assert.Equal(12.0, beyond.Session!.Sweep.Value);
        Assert.Equal("no spec boundary, crossing or band limit above K = 12 in the range", beyond.Message!.Text);
    }

    [Fact]
    public void Boundaries_wait_for_the_trace()
    {
        var (state, effects) = Update.Apply(TestPlants.Opened(), Command.JumpToNextBoundary);
        Assert.Empty(effects);
        Assert.Equal(5.0, state.Session!.Sweep.Value);
        Assert.Equal("the locus is still being traced", state.Message!.Text);
    }

    [Fact]
    public void A_picked_point_sets_the_value()
    {
        var state = Update.Receive(TestPlants.Traced(), new ValuePicked(0.7342)).State;
        Assert.Equal(0.734, state.Session!.Sweep.Value, Tol);
        Assert.Equal("picked K = 0.734 on the plane", state.Message!.Text);
    }

    [Fact]
    public void Without_a_plant_stepping_explains_how_to_open_one()
    {
        var (state, effects) = Update.Apply(WorkbenchState.Initial("/plants"), Command.StepSweepUp);
        Assert.Empty(effects);
        Assert.Equal("no plant open: o opens the library", state.Message!.Text);
    }

    [Fact]
    public void Poles_follow_the_textbook_second_order_figures_at_k_5()
    {
        // -1 ± j2: ωn = √5, ζ = 1/√5 (Ogata 5th ed. §5-3, from memory).
        var upper = TestPlants.Opened().Session!.Poles.Poles.Single(p => p.Imaginary > 0);
        Assert.Equal(new Complex(-1, 2).Real, upper.Real, 1e-9);
        Assert.Equal(2.0, upper.Imaginary, 1e-9);
    }
}
