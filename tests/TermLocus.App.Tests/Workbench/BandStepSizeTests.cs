using TermLocus.App.Text;
using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

/// <summary>The band step: { and } split the varied parameter's band in more or fewer steps (2, 5, 10, 20, 50, 100).</summary>
public class BandStepSizeTests
{
    private const double Tol = 1e-9;

    private static WorkbenchState Opened() => BandPlants.Opened(BandPlants.Quadratic());

    [Theory]
    [InlineData('{', Command.FinerBandStep)]
    [InlineData('<', Command.FinerBandStep)]
    [InlineData('}', Command.CoarserBandStep)]
    [InlineData('>', Command.CoarserBandStep)]
    public void The_band_step_keys_are_plain_characters(char key, Command expected) =>
        Assert.Equal(expected, KeyMap.Lookup(Opened(), KeyChord.Of(key)));

    [Fact]
    public void A_finer_band_step_halves_the_tenth_and_says_so()
    {
        var (state, effects) = Update.Apply(Opened(), Command.FinerBandStep);
        Assert.Empty(effects); // nothing moves until the next step
        Assert.Equal(20, state.Session!.Varied.Divisions);
        Assert.Equal(0.04, state.Session.Varied.Step, Tol); // [1.6, 2.4] in 20 steps
        Assert.Equal("a now steps 1/20 of its band (0.04 1/s)", state.Message!.Text);
        Assert.Equal(2.04, Update.Apply(state, Command.StepBandUp).State.Session!.Varied.Value, Tol);
    }

    [Fact]
    public void The_series_runs_from_halves_to_hundredths_and_stops_at_either_end()
    {
        var state = Opened();
        var seen = new List<int>();
        for (int i = 0; i < 4; i++)
        {
            state = Update.Apply(state, Command.FinerBandStep).State;
            seen.Add(state.Session!.Varied.Divisions);
        }

        Assert.Equal([20, 50, 100, 100], seen);
        Assert.Equal("finest band step already: 1/100 of its band (0.008 1/s)", state.Message!.Text);
        for (int i = 0; i < 6; i++)
        {
            state = Update.Apply(state, Command.CoarserBandStep).State;
        }

        Assert.Equal(2, state.Session!.Varied.Divisions);
        Assert.Equal("coarsest band step already: 1/2 of its band (0.4 1/s)", state.Message!.Text);
    }

    [Fact]
    public void Halves_stop_at_the_ends_and_nominal_even_from_a_value_off_their_grid()
    {
        var state = TestPlants.Run(Opened(), Command.StepBandUp).State; // 2.08, a tenth above nominal
        state = TestPlants.Run(state, Command.CoarserBandStep, Command.CoarserBandStep).State; // halves: 1.6, 2, 2.4
        Assert.Equal(2.4, Update.Apply(state, Command.StepBandUp).State.Session!.Varied.Value, Tol);
        Assert.Equal(2.0, Update.Apply(state, Command.StepBandDown).State.Session!.Varied.Value, Tol);
    }

    [Fact]
    public void The_step_size_stays_when_the_next_parameter_is_varied()
    {
        var state = TestPlants.Run(Opened(), Command.FinerBandStep, Command.NextVariedParameter).State;
        var varied = state.Session!.Varied;
        Assert.Equal("b", varied.Parameter);
        Assert.Equal(20, varied.Divisions);
        Assert.Equal(0.01, varied.Step, Tol); // [0.9, 1.1] in 20 steps
    }

    [Fact]
    public void Without_a_toleranced_parameter_the_keys_say_why_nothing_happens()
    {
        var state = Update.Apply(TestPlants.Opened(), Command.FinerBandStep).State;
        Assert.StartsWith("no toleranced parameter besides K", state.Message!.Text, StringComparison.Ordinal);
    }

    [Fact]
    public void The_parameter_panel_shows_the_band_step()
    {
        var state = Update.Apply(Opened(), Command.FinerBandStep).State;
        // On the step line when it fits (a short panel keeps its specs), shorter or on a line of its own when not.
        Assert.Equal("step 0.2   band step 1/20 = 0.04", Panel(state, 36)[2]);
        Assert.Equal("step 0.2   band step 1/20", Panel(state, 28)[2]);
        var narrow = Panel(state, 22);
        Assert.Equal("step 0.2", narrow[2]);
        Assert.Equal("band step 1/20 = 0.04", narrow[narrow.IndexOf("a = 2 1/s (nominal)") + 2]);
        Assert.Equal("step 0.2", Panel(TestPlants.Opened(), 36)[2]); // nothing toleranced, no band step
    }

    private static List<string> Panel(WorkbenchState state, int width) =>
        ParameterPanelPresenter.Lines(state.Session, width, 14, Glyphs.Unicode).Select(l => l.TrimEnd()).ToList();

    [Fact]
    public void Help_and_hints_name_the_band_step_keys()
    {
        var help = HelpPresenter.Lines(Glyphs.Unicode, 100);
        Assert.Contains(help, l => l.StartsWith("  {  <", StringComparison.Ordinal) && l.Contains("finer band step", StringComparison.Ordinal));
        Assert.Contains(help, l => l.StartsWith("  }  >", StringComparison.Ordinal) && l.Contains("coarser band step", StringComparison.Ordinal));
        Assert.Contains("{/} band step", KeyHints.Line(Opened(), 200, Glyphs.Unicode), StringComparison.Ordinal);
        Assert.DoesNotContain("band step", KeyHints.Line(TestPlants.Opened(), 200, Glyphs.Unicode), StringComparison.Ordinal);
    }
}
