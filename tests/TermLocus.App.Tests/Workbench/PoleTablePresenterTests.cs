using System.Numerics;
using TermLocus.App.Text;
using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class PoleTablePresenterTests
{
    // Figures by hand from the definitions (ζ = σ/ωn, ωn = |s|, t½ = ln2/σ, t×2 = ln2/(-σ)):
    // -1 ± j2: ζ = 1/√5 = 0.4472, ωn = √5 = 2.236, t½ = 0.6931 s; -12.4: t½ = 0.05590 s; +0.05: t×2 = 13.86 s.
    private static readonly PoleSnapshot Snapshot = new(
        5,
        [new Complex(-1, 2), new Complex(-1, -2), new Complex(-12.4, 0), new Complex(0.05, 0)],
        [
            new SpecMiss("min_damping", 0.5, 0.4472, -0.0528, new Complex(-1, -2)),
            new SpecMiss("max_time_to_half", 0.5, 0.6931, -0.1931, new Complex(-1, 2)),
        ]);

    [Fact]
    public void Full_width_table_lists_pairs_once_rightmost_first_and_marks_violations_in_words()
    {
        var lines = PoleTablePresenter.Lines(Snapshot, 0, 80, 6, Glyphs.Unicode);
        Assert.Equal(
            [
                "   pole                   ζ ωn rad/s    σ 1/s     t½ s ωd rad/s  spec           ",
                "▸! 0.05000          -1.0000  0.05000 -0.05000 t×2 13.9        0  unstable       ",
                " ! -1.000 ± j2.000   0.4472    2.236    1.000   0.6931    2.000  ζ low, slow    ",
                "   -12.40            1.0000    12.40    12.40  0.05590        0  ✓              ",
            ],
            lines.ToArray());
    }

    [Fact]
    public void Narrow_tables_drop_columns_from_the_right_but_keep_the_spec_words()
    {
        var lines = PoleTablePresenter.Lines(Snapshot, null, 40, 6, Glyphs.Unicode);
        Assert.Equal(
            [
                "   pole                   ζ  spec       ",
                " ! 0.05000          -1.0000  unstable   ",
                " ! -1.000 ± j2.000   0.4472  ζ low, slow",
                "   -12.40            1.0000  ✓          ",
            ],
            lines.ToArray());
    }

    [Fact]
    public void Ascii_glyphs_spell_symbols_out_and_cut_with_a_tilde()
    {
        var lines = PoleTablePresenter.Lines(Snapshot, 0, 80, 6, Glyphs.Ascii);
        Assert.Equal("   pole                  zeta wn rad/s    sigma   t1/2 s wd rad/s  spec         ", lines[0]);
        Assert.Equal(">! 0.05000            -1.0000  0.05000 -0.05000 t*2 13.9        0  unstable     ", lines[1]);
        Assert.Equal(" ! -1.000 +/- j2.000   0.4472    2.236    1.000   0.6931    2.000  zeta low, sl~", lines[2]);
    }

    [Fact]
    public void A_short_table_scrolls_to_the_selection_and_says_how_many_are_hidden()
    {
        var lines = PoleTablePresenter.Lines(Snapshot, 2, 80, 3, Glyphs.Unicode);
        Assert.Equal(
            [
                "   pole                   ζ ωn rad/s    σ 1/s     t½ s ωd rad/s  spec           ",
                "▸  -12.40            1.0000    12.40    12.40  0.05590        0  ✓              ",
                "  2 more (Tab, then ↑/↓)                                                        ",
            ],
            lines.ToArray());
    }

    [Fact]
    public void A_constant_polynomial_has_no_poles_to_list()
    {
        var lines = PoleTablePresenter.Lines(new PoleSnapshot(0, [], []), null, 70, 4, Glyphs.Unicode);
        Assert.Equal("  no closed-loop poles (the characteristic polynomial is constant)    ", lines[1]);
    }

    [Fact]
    public void Every_line_has_exactly_the_width_asked_for()
    {
        foreach (int width in new[] { 20, 33, 57, 80, 120 })
        {
            Assert.All(PoleTablePresenter.Lines(Snapshot, 1, width, 10, Glyphs.Unicode), l => Assert.Equal(width, TextWidth.Of(l)));
        }
    }
}
