using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class ViewUpdateTests
{
    [Fact]
    public void Zoom_in_and_out_count_steps()
    {
        var state = TestPlants.Run(TestPlants.Opened(), Command.ZoomIn, Command.ZoomIn, Command.ZoomOut).State;
        Assert.Equal(1, state.View.ZoomSteps);
        Assert.Equal(1.5, state.View.ZoomFactor, 1e-12);
    }

    [Fact]
    public void Zoom_stops_at_its_limit_and_says_so()
    {
        var state = TestPlants.Run(TestPlants.Opened(), Enumerable.Repeat(Command.ZoomIn, ViewState.MaxZoomSteps + 1).ToArray()).State;
        Assert.Equal(ViewState.MaxZoomSteps, state.View.ZoomSteps);
        Assert.Equal("zoomed in as far as it goes", state.Message!.Text);
    }

    [Fact]
    public void A_pan_step_is_a_quarter_of_what_is_on_screen()
    {
        var fitted = TestPlants.Run(TestPlants.Opened(), Command.PanLeft, Command.PanUp).State.View;
        Assert.Equal(-0.25, fitted.PanRight, 1e-12);
        Assert.Equal(0.25, fitted.PanUp, 1e-12);
        var zoomed = TestPlants.Run(TestPlants.Opened(), Command.ZoomIn, Command.PanRight, Command.PanDown).State.View;
        Assert.Equal(0.25 / 1.5, zoomed.PanRight, 1e-12);
        Assert.Equal(-0.25 / 1.5, zoomed.PanUp, 1e-12);
    }

    [Fact]
    public void Fit_forgets_zoom_and_pan()
    {
        var state = TestPlants.Run(TestPlants.Opened(), Command.ZoomIn, Command.PanLeft, Command.FitView).State;
        Assert.Equal(ViewState.Fitted, state.View);
    }

    [Fact]
    public void Next_pane_cycles_between_plane_and_poles()
    {
        var state = TestPlants.Opened();
        Assert.Equal(Pane.Poles, Update.Apply(state, Command.NextPane).State.Focus);
        Assert.Equal(Pane.Plane, TestPlants.Run(state, Command.NextPane, Command.NextPane).State.Focus);
    }

    [Fact]
    public void Up_and_down_select_pole_rows_when_the_table_has_focus()
    {
        // K = 0.5: s² + 2s + 0.5 has two real roots -1 ± √0.5, so the table has two rows.
        var state = TestPlants.Opened(TestPlants.SecondOrder(k: 0.5)) with { Focus = Pane.Poles };
        var down = TestPlants.Run(state, Command.MoveDown, Command.MoveDown).State;
        Assert.Equal(1, down.Session!.SelectedPole);
        Assert.Equal(0, TestPlants.Run(down, Command.MoveUp, Command.MoveUp).State.Session!.SelectedPole);
    }
}
