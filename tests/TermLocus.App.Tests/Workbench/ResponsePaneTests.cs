using TermLocus.App.Canvas;
using TermLocus.App.Text;
using TermLocus.App.Workbench;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Workbench;

public class ResponsePaneTests
{
    // 5/(s² + 2s + 5): ζ = 1/√5, ωn = √5, ωd = 2. Overshoot e^{-ζπ/√(1-ζ²)} = e^{-π/2} = 20.79 %, peak at π/ωd = 1.571 s
    // (second-order step response formulas, Ogata, Modern Control Engineering, 5th ed., §5-3; from memory).
    private static WorkbenchState Shown(Specs? specs = null) =>
        BandPlants.Apply(BandPlants.Opened(BandPlants.Quadratic(specs: specs)), Command.ToggleResponse);

    [Fact]
    public void T_shows_the_response_and_simulates_it_for_the_values_on_screen()
    {
        var state = Shown();
        Assert.True(state.ShowsResponse);
        var response = state.Session!.Response!.Response!;
        Assert.True(state.Session.ResponseIsCurrent);
        Assert.Equal(100 * Math.Exp(-Math.PI / 2), response.Figures!.OvershootPct!.Value, 0.05);
        Assert.Equal(Math.PI / 2, response.Figures.PeakTimeSeconds!.Value, 0.01);
        Assert.False(Update.Apply(state, Command.ToggleResponse).State.ShowsResponse);
    }

    [Fact]
    public void The_response_follows_each_step_and_comes_from_the_cache_when_stepping_back()
    {
        var state = Shown();
        var (up, effects) = Update.Apply(state, Command.StepSweepUp);
        Assert.Contains(effects, e => e is SimulateResponseEffect { Key.SweptValue: 5.2 });
        Assert.False(up.Session!.ResponseIsCurrent); // the last plot stays until the new one arrives
        var settled = BandPlants.Settle(up, effects);
        var (back, again) = Update.Apply(settled, Command.StepSweepDown);
        Assert.DoesNotContain(again, e => e is SimulateResponseEffect);
        Assert.True(back.Session!.ResponseIsCurrent);
    }

    [Fact]
    public void A_narrow_pane_puts_the_short_figure_table_under_the_plot()
    {
        var lines = ResponsePanePresenter.Lines(Shown().Session, 48, 12, CanvasSymbols.Ascii, Glyphs.Unicode);
        Assert.Equal(12, lines.Length);
        Assert.All(lines, l => Assert.Equal(48, TextWidth.Of(l)));
        Assert.Equal("figure           simulated  estimate", lines[6].TrimEnd());
        Assert.Equal("overshoot %          20.79     20.79", lines[7].TrimEnd());
        Assert.Equal("peak s               1.571     1.571", lines[8].TrimEnd());
        Assert.Contains("@", string.Join('\n', lines.Take(6)), StringComparison.Ordinal); // the peak marked
    }

    [Fact]
    public void An_overshoot_over_the_files_limit_is_marked()
    {
        var lines = ResponsePanePresenter.Lines(Shown(new Specs(MaxOvershootPct: 15)).Session, 48, 12, CanvasSymbols.Ascii, Glyphs.Unicode);
        Assert.Equal("! overshoot %        20.79     20.79", lines[7].TrimEnd());
    }

    [Fact]
    public void A_wide_pane_puts_the_full_figure_table_beside_the_plot()
    {
        var lines = ResponsePanePresenter.Lines(Shown().Session, 114, 14, CanvasSymbols.Braille, Glyphs.Unicode);
        Assert.Equal("figure                   simulated  2nd-order estimate", lines[0][60..].TrimEnd());
        Assert.StartsWith("overshoot %                  20.79", lines[2][60..], StringComparison.Ordinal);
    }

    [Fact]
    public void A_sampled_loop_draws_the_output_between_samples_and_marks_the_instants()
    {
        // Ogata's sampled motor loop (BandPlants.SampledMotor): the samples at 3 s and 4 s (1.3996, both 'o') sit below
        // the peak between them (@, 44.88 %). 36 instants over 35 s on 97 columns: 2.8 columns apart, so each is marked.
        var state = BandPlants.Apply(BandPlants.Opened(BandPlants.SampledMotor()), Command.ToggleResponse);
        var response = state.Session!.Response!.Response!;
        var lines = ResponsePanePresenter.Lines(state.Session, 160, 16, CanvasSymbols.Ascii, Glyphs.Unicode);
        Assert.Equal("   1.5          @.", lines[0][..104].TrimEnd());
        Assert.Equal("              .o'-o.", lines[1][..104].TrimEnd());
        Assert.Equal("     0 o+_______________________________________________________________________________________________", lines[14][..104].TrimEnd());
        Assert.Equal(response.SampleTrace!.Count, lines.Sum(l => l[..104].Count(c => c == 'o')));
        Assert.Equal("figure                simulated  at samples   estimate", lines[0][106..].TrimEnd());
        Assert.Equal("overshoot %               44.88       39.96      44.53", lines[2][106..].TrimEnd());
        Assert.Equal("simulated between samples, 10 points a sample", lines[7][106..].TrimEnd());
        // The estimates line is longer than its column: wrapped, its parenthesis kept whole, not cut.
        Assert.StartsWith("estimates from the dominant pole(s) ", lines[8][106..], StringComparison.Ordinal);
        Assert.Equal("(ζ 0.2494, ωn 0.9197 rad/s)", lines[9][106..].TrimEnd());
        Assert.Equal("o on the curve: the sample instants", lines[10][106..].TrimEnd());
    }

    [Fact]
    public void A_narrow_pane_gives_the_sampled_figures_a_column_of_their_own()
    {
        var state = BandPlants.Apply(BandPlants.Opened(BandPlants.SampledMotor()), Command.ToggleResponse);
        var lines = ResponsePanePresenter.Lines(state.Session, 48, 14, CanvasSymbols.Ascii, Glyphs.Unicode);
        Assert.Equal("figure           simulated    at kT  estimate", lines[8].TrimEnd());
        Assert.Equal("overshoot %          44.88    39.96     44.53", lines[9].TrimEnd());
        Assert.Equal("peak s               3.460    4.000     3.527", lines[10].TrimEnd());
    }

    [Fact]
    public void Instants_too_close_to_tell_apart_are_not_marked_and_the_pane_says_so()
    {
        // The same 36 instants on 51 columns beside the table: 1.5 columns apart, under the 2 the plot needs.
        var state = BandPlants.Apply(BandPlants.Opened(BandPlants.SampledMotor()), Command.ToggleResponse);
        var lines = ResponsePanePresenter.Lines(state.Session, 114, 14, CanvasSymbols.Ascii, Glyphs.Unicode);
        Assert.DoesNotContain(lines, l => l[..58].Contains('o', StringComparison.Ordinal));
        Assert.Contains(lines, l => l[60..].TrimEnd() == "the sample instants lie too close to mark");
    }

    [Fact]
    public void The_overshoot_limit_is_judged_on_the_peak_between_samples()
    {
        // 42 % passes at the samples (39.96 %) and fails between them (44.88 %).
        var state = BandPlants.Apply(BandPlants.Opened(BandPlants.SampledMotor(new Specs(MaxOvershootPct: 42))), Command.ToggleResponse);
        var lines = ResponsePanePresenter.Lines(state.Session, 48, 14, CanvasSymbols.Ascii, Glyphs.Unicode);
        Assert.Equal("! overshoot %        44.88    39.96     44.53", lines[9].TrimEnd());
    }

    [Fact]
    public void A_loop_given_by_its_characteristic_has_no_response_and_says_why()
    {
        var state = BandPlants.Apply(BandPlants.Opened(BandPlants.SampledFirstOrder()), Command.ToggleResponse);
        var lines = ResponsePanePresenter.Lines(state.Session, 60, 6, CanvasSymbols.Ascii, Glyphs.Unicode);
        Assert.StartsWith("no step response: the loop gives only its", lines[0], StringComparison.Ordinal);
    }

    [Fact]
    public void The_compact_layout_gives_the_response_the_planes_place_and_the_roomy_one_splits_it()
    {
        var compact = ScreenLayout.For(80, 24, response: true);
        Assert.True(compact.Plane.IsEmpty);
        Assert.Equal(ScreenLayout.For(80, 24).Plane, compact.Response);
        var roomy = ScreenLayout.For(160, 48, response: true);
        var plane = ScreenLayout.For(160, 48).Plane;
        Assert.Equal(plane.Height, roomy.Plane.Height + roomy.Response.Height);
        Assert.Equal(roomy.Plane.Y + roomy.Plane.Height, roomy.Response.Y);
    }
}
