using TermLocus.App.Canvas;
using TermLocus.App.Text;
using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class OverlayPresenterTests
{
    [Fact]
    public void The_value_box_says_what_to_type_and_why_the_last_try_failed()
    {
        var state = TestPlants.Opened();
        var lines = OverlayPresenter.ValueEntry(state, new ValueEntryOverlay("1,5", "not a number: '1,5'"), 40, Glyphs.Unicode);
        Assert.Equal(
            ["New value for K (A/V)", "range 0 to 20, now 5", string.Empty, "> 1,5_", "! not a number: '1,5'"],
            lines.Select(l => l.TrimEnd()).ToArray());
    }

    [Fact]
    public void The_quit_question_names_value_file_and_verdict()
    {
        var state = TestPlants.Run(TestPlants.Opened(), Command.StepSweepUp).State;
        var lines = OverlayPresenter.QuitConfirm(state, 80, Glyphs.Unicode).Select(l => l.TrimEnd()).ToArray();
        Assert.Equal("K = 5.2 is not saved in second.toml", lines[0]);
        Assert.Equal("(the file has 5); it meets every spec at the nominal values.", lines[1]);
        Assert.Equal("s save and quit  d quit without saving  Esc keep working", lines[3]);
    }

    [Fact]
    public void Too_small_gives_the_sizes_and_keeps_the_quit_question_readable()
    {
        var state = TestPlants.Run(TestPlants.Opened(), Command.StepSweepUp, Command.Quit).State;
        var lines = OverlayPresenter.TooSmall(state, 40, 12, Glyphs.Ascii).Select(l => l.TrimEnd()).ToArray();
        Assert.Equal("TermLocus needs at least 60x20, have", lines[0]);
        Assert.Equal("40x12.", lines[1]);
        Assert.Contains("K = 5.2 is not saved in second.toml", lines);
        Assert.All(lines, l => Assert.True(l.Length <= 40));
    }

    [Fact]
    public void The_legend_lists_one_mark_a_line()
    {
        var lines = OverlayPresenter.LegendLines(CanvasSymbols.Ascii, 20).Select(l => l.TrimEnd()).ToArray();
        Assert.Equal(["x open-loop pole", "o zero", "# closed-loop pole", "! off spec", ".. spec limit"], lines);
    }
}
