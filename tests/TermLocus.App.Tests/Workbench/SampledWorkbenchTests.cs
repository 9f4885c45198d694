using TermLocus.App.Text;
using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class SampledWorkbenchTests
{
    [Fact]
    public void The_table_lists_roots_in_z_with_figures_from_their_equivalent_s()
    {
        // z = 0.5 at T = 0.1 s: s = ln(0.5)/0.1 = -6.931 1/s, t½ = ln 2/6.931 = 0.1 s (one sample), ζ = 1.
        var poles = BandPlants.Opened(BandPlants.SampledFirstOrder()).Session!.Poles;
        var lines = PoleTablePresenter.Lines(poles with { BandFigures = [] }, null, 80, 2, Glyphs.Unicode);
        Assert.Equal("   pole in z          ζ ωn rad/s    σ 1/s     t½ s ωd rad/s  spec", lines[0].TrimEnd());
        Assert.Equal("   0.5000        1.0000    6.931    6.931   0.1000        0  ✓", lines[1].TrimEnd());
    }

    [Fact]
    public void A_miss_names_the_root_as_drawn_in_z()
    {
        // K = -0.1 puts the root at z = 0.6: s = ln(0.6)/0.1 = -5.108 1/s, t½ = ln 2/5.108 = 0.1357 s > 0.12 s.
        var loaded = BandPlants.SampledFirstOrder();
        var session = BandPlants.Opened(loaded).Session!;
        var poles = CoreBridge.PolesAt(loaded, -0.1);
        Assert.Equal(
            "! max_time_to_half: t½ 0.1357 > 0.12 at 0.6000",
            StatusLinePresenter.Verdict(session with { Poles = poles }, Glyphs.Unicode));
    }

    [Fact]
    public void A_root_outside_the_unit_circle_is_unstable()
    {
        // K = -0.6 puts the root at z = 1.1: it grows by 10 % every sample.
        var loaded = BandPlants.SampledFirstOrder();
        var session = BandPlants.Opened(loaded).Session!;
        var poles = CoreBridge.PolesAt(loaded, -0.6) with { Misses = [] };
        Assert.Equal(
            "! unstable: a pole at 1.100 is outside the unit circle",
            StatusLinePresenter.Verdict(session with { Poles = poles }, Glyphs.Unicode));
    }

    [Fact]
    public void The_plane_draws_the_unit_circle()
    {
        var state = BandPlants.Opened(BandPlants.SampledFirstOrder());
        var (scene, _) = PlanePresenter.SceneAndView(state, 40, 12);
        Assert.Contains(scene.Boundaries, b => b.Kind == TermLocus.App.Plot.BoundaryKind.UnitCircle);
    }
}
