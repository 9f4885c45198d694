using TermLocus.App.Text;
using TermLocus.App.Workbench;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Workbench;

public class ParameterPanelPresenterTests
{
    [Fact]
    public void Shows_title_value_step_saved_state_bar_file_specs_and_note()
    {
        var state = TestPlants.Opened(TestPlants.SecondOrder(specs: new Specs(MinDamping: 0.5, MaxTimeToHalfSeconds: 0.5)));
        var stepped = TestPlants.Run(state, Command.StepSweepUp).State;
        var lines = ParameterPanelPresenter.Lines(stepped.Session, 40, 10, Glyphs.Unicode);
        Assert.Equal(
            [
                "Textbook second-order loop              ",
                "K = 5.2 A/V                             ",
                "step 0.2                                ",
                "! unsaved (file: 5)                     ",
                "0 ─────────●························· 20",
                "file: second.toml                       ",
                "specs: ζ ≥ 0.5  t½ ≤ 0.5 s              ",
                "Invented example for tests.             ",
            ],
            lines.ToArray());
    }

    [Fact]
    public void A_narrow_panel_lists_one_spec_a_line_and_keeps_the_first_lines()
    {
        var state = TestPlants.Opened(TestPlants.SecondOrder(specs: new Specs(MinDamping: 0.6, MaxNaturalFrequency: 400)));
        var lines = ParameterPanelPresenter.Lines(state.Session, 24, 9, Glyphs.Ascii);
        string[] expected =
            [
                "Textbook second-order l~",
                "K = 5 A/V               ",
                "step 0.2                ",
                "saved in the file       ",
                "0 ----#.............. 20",
                "file: second.toml       ",
                "specs:                  ",
                "  zeta >= 0.6           ",
                "  wn <= 400 rad/s       ",
            ];
        Assert.Equal(expected.Select(l => TextWidth.PadRight(l, 24)).ToArray(), lines.ToArray());
    }

    [Fact]
    public void Untrusted_title_and_unit_are_made_safe()
    {
        var loaded = TestPlants.SecondOrder(title: "Evil \u001b]2;pwned\u0007 \u202Eloop");
        var state = TestPlants.Opened(loaded);
        var lines = ParameterPanelPresenter.Lines(state.Session, 60, 1, Glyphs.Unicode);
        Assert.Equal(TextWidth.PadRight("Evil ^[]2;pwned^G <U+202E>loop", 60), lines[0]);
    }

    [Fact]
    public void Without_a_plant_it_says_how_to_open_one()
    {
        var lines = ParameterPanelPresenter.Lines(null, 30, 5, Glyphs.Unicode);
        Assert.Equal(new[] {"no plant open                 ", "o opens the library           ", "? shows the keys              "}, lines.ToArray());
    }
}
