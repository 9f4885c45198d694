using TermLocus.App.Text;
using TermLocus.App.Workbench;
using TermLocus.Core.Plants;

namespace TermLocus.App.Tests.Workbench;

public class DesignUpdateTests
{
    // K/(s(s+a)), a in [1.6, 2.4], ζ ≥ 0.4: ζ = a/(2√K) for K > a²/4 (else real poles, ζ = 1), lowest at a = 1.6, so
    // every corner meets the limit exactly for K ≤ (0.8/0.4)² = 4 (closed form, see BandPlants.Quadratic).
    private static WorkbenchState Designed()
    {
        var opened = BandPlants.Opened(BandPlants.Quadratic());
        return Update.Receive(opened, CoreBridge.Design(opened.Session!.Loaded)).State;
    }

    [Fact]
    public void Opening_a_plant_asks_for_its_design()
    {
        var (start, _) = Update.Start(null, TestPlants.Folder);
        var (_, effects) = Update.Receive(start, new PlantLoaded(BandPlants.Quadratic()));
        Assert.Contains(effects, e => e is DesignEffect);
    }

    [Fact]
    public void The_feasible_interval_ends_where_the_worst_corner_reaches_the_damping_limit()
    {
        var result = Designed().Session!.Design!.Result!;
        var interval = Assert.Single(result.Intervals);
        Assert.Equal(4.0, interval.To, 1e-6);
        Assert.Contains("min_damping", interval.ToLimitedBy);
        Assert.InRange(result.Recommended!.Value, interval.From, interval.To);
    }

    [Fact]
    public void D_jumps_to_the_recommended_value_and_names_the_limit_at_the_nearest_end()
    {
        var state = Designed();
        var (after, _) = Update.Apply(state, Command.JumpToRecommended);
        double recommended = state.Session!.Design!.Result!.Recommended!.Value;
        Assert.Equal(recommended, after.Session!.Sweep.Value, 0.0); // the design's own number, not re-rounded
        Assert.StartsWith($"recommended K = {NumberText.Exact(after.Session.Sweep.Value)} in ", after.Message!.Text, StringComparison.Ordinal);
        Assert.Contains("nearest end", after.Message.Text, StringComparison.Ordinal);
    }

    [Fact]
    public void D_gives_the_number_the_design_report_prints_and_the_check_was_run_at()
    {
        var state = Designed();
        var result = state.Session!.Design!.Result!;
        double recommended = result.Recommended!.Value;
        // Six significant digits at most, so the shortest spelling is the reported one.
        Assert.Equal(NumberText.Short(recommended, 6), NumberText.Exact(recommended));
        var report = TermLocus.App.Reports.DesignReportPresenter.Lines("quadratic.toml", state.Session.Loaded.Plant, result, Glyphs.Ascii);
        string text = NumberText.Exact(recommended);
        Assert.Contains(report, l => l.Contains($"recommended: K = {text} A/V", StringComparison.Ordinal));
        Assert.Contains(report, l => l.Contains($"band check at K = {text} ", StringComparison.Ordinal));
        Assert.Equal(recommended, result.Recommended.Check.Values["K"], 0.0); // the band check ran at that very number

        var after = Update.Apply(state, Command.JumpToRecommended).State;
        Assert.Equal($"K = {text} A/V", ParameterPanelPresenter.ValueLine(after.Session!.Sweep));
        Assert.StartsWith($"recommended K = {text} in ", after.Message!.Text, StringComparison.Ordinal);
        Assert.EndsWith($"d {text}", DesignBarPresenter.Line(after.Session, 80, Glyphs.Ascii)!.TrimEnd(), StringComparison.Ordinal);
    }

    [Fact]
    public void P_and_n_stop_at_the_design_interval_ends_and_say_the_band_fails_beyond()
    {
        // The interval ends at K = 4 where the a = 1.6 corner reaches ζ = 0.4 (see Designed); the nominal loop
        // (a = 2) keeps ζ >= 0.4 up to K = 6.25, its spec boundary, and breaks away from the real axis at K = 1.
        var (start, _) = Update.Start(null, TestPlants.Folder);
        var (opened, effects) = Update.Receive(start, new PlantLoaded(BandPlants.Quadratic()));
        var state = BandPlants.Settle(opened, effects);
        Assert.NotNull(state.Session!.Locus);
        Assert.NotNull(state.Session.Design?.Result);

        var limit = BandPlants.Apply(state, Command.JumpToPreviousBoundary);
        Assert.Equal(4.0, limit.Session!.Sweep.Value, 0.0);
        Assert.Equal("band limit at K = 4; above it the band misses min_damping", limit.Message!.Text);
        var next = BandPlants.Apply(limit, Command.JumpToNextBoundary);
        Assert.Equal(6.25, next.Session!.Sweep.Value, 1e-6);
        Assert.StartsWith("min_damping boundary at K = 6.25", next.Message!.Text, StringComparison.Ordinal);
        var back = BandPlants.Apply(next, Command.JumpToPreviousBoundary);
        Assert.Equal(4.0, back.Session!.Sweep.Value, 0.0);
        var below = BandPlants.Apply(back, Command.JumpToPreviousBoundary);
        Assert.Equal(1.0, below.Session!.Sweep.Value, 1e-6);
    }

    [Fact]
    public void A_narrow_interval_keeps_an_equals_sign_beside_the_markers()
    {
        // The interval [0, 4] on a span of [0, 400]: under one cell, where the recommended value's '|' and the
        // value's '#' both land; an '=' must still say there is an interval.
        var session = Designed().Session!;
        var wide = session.Design! with { Result = session.Design.Result! with { Span = new Interval(0, 400) } };
        var narrow = session with { Design = wide, Sweep = session.Sweep with { Value = 1 } };
        string line = DesignBarPresenter.Line(narrow, 80, Glyphs.Ascii)!;
        string bar = line[(line.IndexOf('[', StringComparison.Ordinal) + 1)..line.IndexOf(']', StringComparison.Ordinal)];
        Assert.StartsWith("#=", bar, StringComparison.Ordinal);
        Assert.Equal(1, bar.Count(c => c == '='));
    }

    [Fact]
    public void D_before_the_design_is_back_says_so_and_leaves_the_value()
    {
        var (start, _) = Update.Start(null, TestPlants.Folder);
        var opened = Update.Receive(start, new PlantLoaded(BandPlants.Quadratic())).State;
        var (state, _) = Update.Apply(opened, Command.JumpToRecommended);
        Assert.Equal(5.0, state.Session!.Sweep.Value);
        Assert.StartsWith("the feasible intervals are still being worked out", state.Message!.Text, StringComparison.Ordinal);
    }

    [Fact]
    public void The_bar_shows_the_feasible_cells_the_value_and_the_numbers()
    {
        // Span [0, 20] in 20 cells of 1: cells 0 to 3 feasible (K ≤ 4), the value K = 5 in cell 5.
        var session = Designed().Session!;
        string line = DesignBarPresenter.Line(session, 60, Glyphs.Ascii)!;
        string rec = NumberText.Short(session.Design!.Result!.Recommended!.Value, 4);
        Assert.Equal(60, line.Length);
        Assert.StartsWith("feasible K [", line, StringComparison.Ordinal);
        int open = line.IndexOf('[', StringComparison.Ordinal), close = line.IndexOf(']', StringComparison.Ordinal);
        string bar = line[(open + 1)..close];
        int cells = bar.Length;
        int valueCell = (int)(5.0 / 20 * cells);
        Assert.Equal('#', bar[valueCell]);
        for (int i = 0; i < cells; i++)
        {
            double low = 20.0 * i / cells, high = 20.0 * (i + 1) / cells;
            if (high <= 4 && bar[i] != '|')
            {
                Assert.Equal('=', bar[i]);
            }
            else if (low >= 4 && i != valueCell)
            {
                Assert.Equal('-', bar[i]);
            }
        }

        Assert.EndsWith($"..4 d {rec}", line.TrimEnd(), StringComparison.Ordinal);
    }

    [Fact]
    public void An_overshoot_limit_shortens_the_bar_and_d_stays_inside_it()
    {
        // As above with max_overshoot_pct = 10 besides ζ >= 0.4. Overshoot 100·exp(-πζ/√(1-ζ²)) <= 10 % needs
        // ζ >= 0.5912 (Ogata, Modern Control Engineering, 5th ed., §5-3; from memory), at a = 1.6 K <= (0.8/0.5912)²
        // = 1.831, well inside the damping limit's 4.
        var opened = BandPlants.Opened(BandPlants.Quadratic(specs: new Specs(MinDamping: 0.4, MaxOvershootPct: 10)));
        var state = Update.Receive(opened, CoreBridge.Design(opened.Session!.Loaded)).State;
        var result = state.Session!.Design!.Result!;
        double l = Math.Log(0.1), zeta = -l / Math.Sqrt((Math.PI * Math.PI) + (l * l)), upper = Math.Pow(0.8 / zeta, 2);
        var interval = Assert.Single(result.Intervals);
        Assert.Equal(upper, interval.To, 1e-5 * upper);
        Assert.Equal(["max_overshoot_pct"], [.. interval.ToLimitedBy]);
        string line = DesignBarPresenter.Line(state.Session, 60, Glyphs.Ascii)!;
        Assert.Contains("..1.831 d ", line, StringComparison.Ordinal);

        var (after, _) = Update.Apply(state, Command.JumpToRecommended);
        Assert.InRange(after.Session!.Sweep.Value, interval.From, interval.To);
        Assert.Contains("..1.831;", after.Message!.Text, StringComparison.Ordinal);
    }

    [Fact]
    public void Without_a_loop_model_there_is_no_bar()
    {
        Assert.Null(DesignBarPresenter.Line(TestPlants.Opened().Session, 60, Glyphs.Ascii));
    }
}
