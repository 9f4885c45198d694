using System.Numerics;
using TermLocus.App.Text;
using TermLocus.App.Workbench;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Workbench;

public class StatusLinePresenterTests
{
    private static string Pad(string s) => TextWidth.PadRight(s, 80);

    [Fact]
    public void All_met_names_the_value_and_hints_come_from_the_key_table()
    {
        var lines = StatusLinePresenter.Lines(TestPlants.Opened(), 80, 3, Glyphs.Unicode);
        Assert.Equal(
            [
                Pad("✓ all specs met at K = 5"),
                Pad(string.Empty),
                Pad("←/→ step  [/] step size  = value  t response  o library  s save  ? help  q quit"),
            ],
            lines.ToArray());
    }

    [Fact]
    public void The_worst_violation_is_told_in_words_and_numbers()
    {
        var opened = TestPlants.Opened();
        var poles = new PoleSnapshot(5, [new Complex(-1, 2), new Complex(-1, -2)],
        [
            new SpecMiss("min_damping", 0.5, 0.4472, -0.0528, new Complex(-1, -2)),
            new SpecMiss("max_time_to_half", 0.5, 0.6931, -0.1931, new Complex(-1, 2)),
        ]);
        var state = opened with { Session = opened.Session! with { Poles = poles } };
        var lines = StatusLinePresenter.Lines(state, 80, 2, Glyphs.Unicode);
        Assert.Equal(Pad("! min_damping: ζ 0.4472 < 0.5 at -1.000 ± j2.000  (+1 more)"), lines[0]);
    }

    [Fact]
    public void A_maximum_limit_reads_with_a_greater_than()
    {
        var miss = new SpecMiss("max_natural_frequency", 400, 612.5, -212.5, new Complex(-300, 534));
        Assert.Equal("max_natural_frequency: ωn 612.5 > 400 at -300.0 ± j534.0", SpecWording.Violation(miss, Glyphs.Unicode));
    }

    [Fact]
    public void An_unstable_pole_is_flagged_even_without_a_spec()
    {
        // K = -1: s² + 2s - 1 has roots -1 ± √2, one of them (0.4142) in the right half-plane.
        var state = TestPlants.Opened(TestPlants.SecondOrder(k: -1, specs: Specs.None));
        Assert.Equal("! unstable: a pole at 0.4142 is in the right half-plane", StatusLinePresenter.Verdict(state.Session, Glyphs.Unicode));
    }

    [Fact]
    public void A_figure_on_its_limit_gets_the_digits_that_tell_it_from_the_limit()
    {
        // A boundary reached with p: t½ a hair over 0.12 s. "0.12 > 0.12" contradicts itself (common practice).
        var miss = new SpecMiss("max_time_to_half", 0.12, 0.1200000123, -1.23e-8, new Complex(-5.776, 0));
        Assert.Equal("max_time_to_half: t½ 0.12000001 > 0.12 at -5.776", SpecWording.Violation(miss, Glyphs.Unicode));
    }

    [Fact]
    public void A_pole_at_the_origin_is_on_the_stability_boundary_not_unstable()
    {
        // K = 0: s² + 2s has roots 0 and -2; a pole at s = 0 neither decays nor grows (marginal; Ogata, Modern
        // Control Engineering, 5th ed., §5-6; from memory).
        var state = TestPlants.Opened(TestPlants.SecondOrder(k: 0, specs: Specs.None));
        Assert.Equal("! marginal: a pole at 0 is on the imaginary axis, the stability boundary",
            StatusLinePresenter.Verdict(state.Session, Glyphs.Unicode));
        var table = PoleTablePresenter.Lines(state.Session!.Poles, null, 60, 4, Glyphs.Ascii);
        Assert.Contains(table, l => l.Contains("marginal", StringComparison.Ordinal));
        Assert.DoesNotContain(table, l => l.Contains("unstable", StringComparison.Ordinal));
    }

    [Fact]
    public void A_file_without_specs_says_so()
    {
        var state = TestPlants.Opened(TestPlants.SecondOrder(specs: Specs.None));
        Assert.Equal("✓ stable at K = 5; the file sets no specs", StatusLinePresenter.Verdict(state.Session, Glyphs.Unicode));
    }

    [Fact]
    public void A_message_takes_the_second_line_and_errors_say_error()
    {
        var state = TestPlants.Opened() with { Message = StatusMessage.Error("not saved: disk full") };
        var lines = StatusLinePresenter.Lines(state, 80, 2, Glyphs.Ascii);
        Assert.Equal(Pad("ok all specs met at K = 5"), lines[0]);
        Assert.Equal(Pad("error: not saved: disk full"), lines[1]);
    }

    [Fact]
    public void A_located_error_is_not_told_twice_that_it_is_an_error()
    {
        var state = TestPlants.Opened() with { Message = StatusMessage.Error("broken.toml:5:20: error: expected ')'") };
        var lines = StatusLinePresenter.Lines(state, 80, 2, Glyphs.Ascii);
        Assert.Equal(Pad("broken.toml:5:20: error: expected ')'"), lines[1]);
    }

    [Fact]
    public void Overlays_show_their_own_hints()
    {
        var quit = TestPlants.Opened() with { Overlay = new QuitConfirmOverlay() };
        Assert.Equal("s save and quit  d quit without saving  Esc keep working", KeyHints.Line(quit, 80, Glyphs.Unicode));
        var entry = TestPlants.Opened() with { Overlay = new ValueEntryOverlay(string.Empty, null) };
        Assert.Equal("Enter set  Esc cancel  Backspace delete", KeyHints.Line(entry, 80, Glyphs.Unicode));
        var library = TestPlants.Opened() with { Overlay = new LibraryOverlay(0) };
        Assert.Equal("↑/↓ choose  Enter open  Esc close", KeyHints.Line(library, 80, Glyphs.Unicode));
    }

    [Fact]
    public void Narrow_hints_keep_help_and_quit()
    {
        Assert.Equal("←/→ step  ? help  q quit", KeyHints.Line(TestPlants.Opened(), 30, Glyphs.Unicode));
        Assert.Equal("? help  q quit", KeyHints.Line(TestPlants.Opened(), 16, Glyphs.Unicode));
    }
}

public class SpecCheckThroughTheWorkbenchTests
{
    [Fact]
    public void Stepping_into_a_violation_shows_it_at_once()
    {
        // At K = 5 the poles are -1 ± j2 with ζ = 1/√5 = 0.4472 (Ogata 5th ed. §5-3, from memory), below 0.5.
        var state = TestPlants.Opened(TestPlants.SecondOrder(k: 5, specs: new Specs(MinDamping: 0.5)));
        Assert.Equal("! min_damping: ζ 0.4472 < 0.5 at -1.000 ± j2.000", StatusLinePresenter.Verdict(state.Session, Glyphs.Unicode));
        // K = 4 is the boundary (ζ = 1/√4 = 0.5 exactly; a pole on the limit meets it).
        var boundary = Update.Receive(state, new ValuePicked(4)).State;
        Assert.Equal("✓ all specs met at K = 4", StatusLinePresenter.Verdict(boundary.Session, Glyphs.Unicode));
    }

    [Fact]
    public void A_time_limit_on_a_pole_that_does_not_decay_says_so()
    {
        // K = -1: roots -1 ± √2; the one at +0.4142 grows, so it never halves.
        var state = TestPlants.Opened(TestPlants.SecondOrder(k: -1, specs: new Specs(MaxTimeToHalfSeconds: 1)));
        Assert.Equal("! max_time_to_half 1: the pole at 0.4142 does not decay", StatusLinePresenter.Verdict(state.Session, Glyphs.Unicode));
    }
}
