using System.Numerics;
using TermLocus.App.Text;
using TermLocus.App.Workbench;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Workbench;

public class BandFiguresTests
{
    [Fact]
    public void The_pair_is_worst_at_the_low_end_of_the_band()
    {
        // ζ = a/(2√K), σ = a/2: at K = 5 the lowest over a in [1.6, 2.4] is at a = 1.6: ζ = 0.8/√5, σ = 0.8.
        var poles = BandPlants.Opened(BandPlants.Quadratic()).Session!.Poles;
        var pair = Assert.Single(poles.BandFigures);
        Assert.Equal(0.8 / Math.Sqrt(5), pair.WorstDamping!.Value, 1e-9);
        Assert.Equal(0.8, pair.WorstDecayRate!.Value, 1e-9);
    }

    [Fact]
    public void One_percent_more_of_the_varied_parameter_moves_damping_and_decay_rate_by_the_closed_form_amounts()
    {
        // dζ/da = 1/(2√K), dσ/da = 1/2 (differentiating ζ = a/(2√K), σ = a/2); +1 % of a = 2 is 0.02:
        // Δζ = 0.02/(2√5) = 0.004472, Δσ = 0.01 1/s. The workbench moves the pole to first order and reads ζ there,
        // so Δζ carries a second-order error of about 4e-6.
        var figures = Assert.Single(BandPlants.Opened(BandPlants.Quadratic()).Session!.Poles.BandFigures);
        Assert.Equal(0.02 / (2 * Math.Sqrt(5)), figures.DampingPerPercent!.Value, 1e-5);
        Assert.Equal(0.01, figures.DecayRatePerPercent!.Value, 1e-9);
        Assert.False(figures.NearMultipleRoot);
    }

    [Fact]
    public void At_a_double_root_the_sensitivity_is_undefined_and_the_table_says_so()
    {
        // K = a²/4 = 1 puts a double root at s = -1 (discriminant zero).
        var poles = BandPlants.Opened(BandPlants.Quadratic(k: 1)).Session!.Poles;
        Assert.All(poles.BandFigures, f => Assert.True(f.NearMultipleRoot));
        var lines = PoleTablePresenter.Lines(poles, null, 80, 5, Glyphs.Unicode);
        Assert.Equal("  +1 % a at -1.000: undefined near a multiple root", lines[^1].TrimEnd());
    }

    [Fact]
    public void The_table_shows_band_columns_and_a_sensitivity_line_at_80_columns()
    {
        var poles = BandPlants.Opened(BandPlants.Quadratic()).Session!.Poles;
        var lines = PoleTablePresenter.Lines(poles, null, 80, 5, Glyphs.Unicode);
        Assert.Equal("   pole                   ζ   ζ band ωn rad/s    σ 1/s   σ band  spec", lines[0].TrimEnd());
        Assert.Equal("   -1.000 ± j2.000   0.4472   0.3578    2.236    1.000   0.8000  ✓", lines[1].TrimEnd());
        Assert.Equal(string.Empty, lines[2].Trim());
        Assert.Equal(string.Empty, lines[3].Trim());
        Assert.Equal("  +1 % a moves -1.000 ± j2.000: ζ +0.00447, σ +0.0100 1/s", lines[4].TrimEnd());
        Assert.All(lines, l => Assert.Equal(80, l.Length));
    }

    [Fact]
    public void A_wide_table_shows_the_sensitivity_in_columns_instead()
    {
        var poles = BandPlants.Opened(BandPlants.Quadratic()).Session!.Poles;
        var lines = PoleTablePresenter.Lines(poles, null, 120, 3, Glyphs.Unicode);
        Assert.Equal(
            "   pole                   ζ   ζ band ωn rad/s    σ 1/s   σ band     t½ s ωd rad/s   Δζ/+1%   Δσ/+1%  spec",
            lines[0].TrimEnd());
        Assert.Equal(
            "   -1.000 ± j2.000   0.4472   0.3578    2.236    1.000   0.8000   0.6931    2.000 +0.00447  +0.0100  ✓",
            lines[1].TrimEnd());
    }

    [Fact]
    public void The_status_line_flags_a_spec_missed_somewhere_in_the_band_and_names_the_corner()
    {
        // At a = 1.6 (-20 %): ζ = 0.8/√5 = 0.3578 < 0.4 at -0.8 ± j√4.36 = -0.8 ± j2.088. b does not enter the
        // poles; the corner named is the first worst one found, b at its low end.
        var session = BandPlants.Opened(BandPlants.Quadratic()).Session!;
        Assert.Equal(
            "! in band: min_damping: ζ 0.3578 < 0.4 at -0.8000 ± j2.088 with a -20 %, b -10 %",
            StatusLinePresenter.Verdict(session, Glyphs.Unicode));
    }

    [Fact]
    public void Poles_shown_off_nominal_name_the_varied_value()
    {
        var state = BandPlants.Opened(BandPlants.Quadratic());
        for (int i = 0; i < 5; i++)
        {
            state = BandPlants.Apply(state, Command.StepBandDown);
        }

        Assert.Equal(
            "! min_damping: ζ 0.3578 < 0.4 at -0.8000 ± j2.088 (with a 1.6 (-20 %))",
            StatusLinePresenter.Verdict(state.Session, Glyphs.Unicode));
    }

    [Fact]
    public void A_band_that_passes_says_so()
    {
        var session = BandPlants.Opened(BandPlants.Quadratic(specs: new Specs(MinDamping: 0.3))).Session!;
        Assert.Equal("✓ all specs met across the band at K = 5", StatusLinePresenter.Verdict(session, Glyphs.Unicode));
    }

    [Fact]
    public void The_parameter_panel_shows_the_varied_value_and_its_place_in_the_band()
    {
        var state = TestPlants.Run(BandPlants.Opened(BandPlants.Quadratic()), Command.StepBandUp).State;
        var lines = ParameterPanelPresenter.Lines(state.Session, 28, 8, Glyphs.Unicode);
        Assert.Equal("a = 2.08 1/s (+4 %)", lines[5].TrimEnd());
        // 20 cells; (2.08 - 1.6)/0.8 = 0.6 of the way: cell round(0.6 × 19) = 11.
        Assert.Equal("1.6 ───────────●········ 2.4", lines[6].TrimEnd());
    }

    [Fact]
    public void Trails_follow_each_pole_across_the_whole_band()
    {
        var band = BandPlants.Opened(BandPlants.Quadratic()).Session!.Band!;
        Assert.Equal(2, band.Trails.Length);
        foreach (var trail in band.Trails)
        {
            Assert.Equal(1.6, trail[0].Value, 1e-12);
            Assert.Equal(2.4, trail[^1].Value, 1e-12);
            // Each trail stays in its own half-plane: the upper member never swaps with the lower one.
            Assert.True(trail.All(p => Math.Sign(p.Pole.Imaginary) == Math.Sign(trail[0].Pole.Imaginary)));
        }
    }

    [Fact]
    public void The_linker_keeps_two_crossing_paths_apart_by_nearness()
    {
        // Roots 0 and 10 moving towards each other by 1 per sample: the nearest continuation keeps each on its side.
        var samples = Enumerable.Range(0, 4)
            .Select(i => ((double)i, System.Collections.Immutable.ImmutableArray.Create(new Complex(10 - i, 0), new Complex(i, 0))))
            .ToList();
        var paths = TrailLinker.Link(samples);
        Assert.Equal(2, paths.Length);
        Assert.Equal([0.0, 1, 2, 3], paths.Single(p => p[0].Pole.Real == 0).Select(p => p.Pole.Real));
    }
}
