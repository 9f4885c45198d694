using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class MessageUpdateTests
{
    [Fact]
    public void Starting_on_a_file_scans_its_folder_and_loads_it()
    {
        var (state, effects) = Update.Start("/plants/second.toml", "/plants");
        Assert.Null(state.Session);
        Assert.Equal<Effect>([new ScanLibraryEffect("/plants"), new LoadPlantEffect("/plants/second.toml")], effects);
    }

    [Fact]
    public void A_loaded_plant_asks_for_its_trace()
    {
        var loaded = TestPlants.SecondOrder();
        var (state, effects) = Update.Receive(WorkbenchState.Initial("/plants"), new PlantLoaded(loaded));
        Assert.Null(state.Session!.Locus);
        Assert.Equal<Effect>([new TraceLocusEffect(loaded, loaded.NominalKey)], effects);
        Assert.Equal("opened second.toml", state.Message!.Text);
    }

    [Fact]
    public void A_trace_for_the_current_inputs_is_shown_and_cached()
    {
        var state = TestPlants.Traced(new SweepMark(3, SweepMarkKind.BreakPoint, null));
        Assert.NotNull(state.Session!.Locus);
        Assert.Single(state.Session.Cache.Entries);
    }

    [Fact]
    public void A_trace_for_other_inputs_is_only_cached()
    {
        var state = TestPlants.Opened();
        var other = TraceKey.For(state.Session!.Loaded.Plant, new Dictionary<string, double> { ["B"] = 0.5 });
        var next = Update.Receive(state, new LocusTraced(new LocusAnalysis(other, [], []))).State;
        Assert.Null(next.Session!.Locus);
        Assert.Single(next.Session.Cache.Entries);
    }

    [Fact]
    public void Opening_the_same_plant_again_reuses_the_cached_trace()
    {
        var traced = TestPlants.Traced();
        var (state, effects) = Update.Receive(traced, new PlantLoaded(traced.Session!.Loaded));
        Assert.Empty(effects);
        Assert.Same(traced.Session.Locus, state.Session!.Locus);
    }

    [Fact]
    public void The_trace_key_ignores_the_swept_value()
    {
        var plant = TestPlants.SecondOrder().Plant;
        var a = TraceKey.For(plant, new Dictionary<string, double> { ["K"] = 1, ["J"] = 2 });
        var b = TraceKey.For(plant, new Dictionary<string, double> { ["K"] = 7, ["J"] = 2 });
        var c = TraceKey.For(plant, new Dictionary<string, double> { ["K"] = 1, ["J"] = 3 });
        Assert.Equal(a, b);
        Assert.NotEqual(a, c);
    }

    [Fact]
    public void The_cache_keeps_only_the_newest_entries()
    {
        var plant = TestPlants.SecondOrder().Plant;
        var cache = LocusCache.Empty;
        for (int i = 0; i < LocusCache.Capacity + 3; i++)
        {
            cache = cache.With(new LocusAnalysis(TraceKey.For(plant, new Dictionary<string, double> { ["J"] = i }), [], []));
        }

        Assert.Equal(LocusCache.Capacity, cache.Entries.Length);
        Assert.Null(cache.Find(TraceKey.For(plant, new Dictionary<string, double> { ["J"] = 0 })));
        Assert.NotNull(cache.Find(TraceKey.For(plant, new Dictionary<string, double> { ["J"] = LocusCache.Capacity + 2 })));
    }

    [Fact]
    public void A_scanned_library_opens_when_no_plant_is_open()
    {
        var (start, _) = Update.Start(null, "/plants");
        var state = Update.Receive(start, new LibraryScanned("/plants", TestPlants.LibraryItems())).State;
        Assert.Equal(new LibraryOverlay(0), state.Overlay);
        Assert.True(state.Library.Scanned);
        Assert.Equal(3, state.Library.Items.Length);
    }

    [Fact]
    public void A_scan_of_another_folder_is_ignored()
    {
        var (start, _) = Update.Start(null, "/plants");
        Assert.Equal(start, Update.Receive(start, new LibraryScanned("/elsewhere", TestPlants.LibraryItems())).State);
    }

    [Fact]
    public void A_load_failure_is_shown_with_control_characters_made_visible()
    {
        var state = Update.Receive(TestPlants.Opened(), new PlantLoadFailed("/plants/x.toml", "x.toml:1:1: error: bad \u001b]0;owned\u0007")).State;
        Assert.Equal(MessageKind.Error, state.Message!.Kind);
        Assert.Equal("x.toml:1:1: error: bad ^[]0;owned^G", state.Message.Text);
    }

    [Fact]
    public void A_failed_trace_is_reported()
    {
        var state = TestPlants.Opened();
        var next = Update.Receive(state, new LocusTraceFailed(state.Session!.Loaded.NominalKey, "no roots")).State;
        Assert.Equal("could not trace the locus: no roots", next.Message!.Text);
    }
}
