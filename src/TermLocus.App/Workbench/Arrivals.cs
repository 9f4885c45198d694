using System.Collections.Immutable;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>What the workbench does when an effect's outcome arrives.</summary>
internal static class Arrivals
{
    public static (WorkbenchState, ImmutableArray<Effect>) PlantLoaded(WorkbenchState s, PlantLoaded arrived)
    {
        var loaded = arrived.Loaded;
        var plant = loaded.Plant;
        var parameter = plant.SweptParameter;
        bool keeps = arrived.Kept is { } kept && kept.Parameter == parameter.Name;
        double value = keeps ? arrived.Kept!.Value : parameter.Value;
        var sweep = new SweepState(
            parameter.Name, parameter.Unit, value, parameter.Value, StepSeries.Initial(loaded.Range.Width), loaded.Range);
        var cache = s.Session?.Cache ?? LocusCache.Empty;
        var opened = new PlantSession(
            loaded, sweep, VariedPosition.First(plant), null, cache, CoreBridge.PolesAt(loaded, sweep.Value), 0);
        var (session, effects) = Recompute.Session(opened, s.ShowsResponse);
        var state = s with
        {
            Session = session,
            View = ViewState.Fitted,
            Overlay = s.Overlay is LibraryOverlay ? Overlay.None : s.Overlay,
            Message = StatusMessage.Info(OpenedWords(arrived, sweep)),
        };
        if (arrived.Recovery is { } recovery)
        {
            state = Recovering.Offer(state, recovery);
        }

        return loaded.Model is null ? (state, effects) : (state, effects.Add(new DesignEffect(loaded)));
    }

    /// <summary>A save that failed: the file is unchanged, the value still unsaved.</summary>
    public static (WorkbenchState, ImmutableArray<Effect>) SaveFailed(WorkbenchState s, OperatingPointSaveFailed failed) => Update.Done(s with
    {
        Session = s.Session is { } session ? session with { SaveInFlight = false } : null,
        Message = StatusMessage.Error("not saved: " + SafeText.Visible(failed.Problem)),
    });

    /// <summary>A plant file that failed to load; when it was the open one being read again, the session stays.</summary>
    public static (WorkbenchState, ImmutableArray<Effect>) PlantLoadFailed(WorkbenchState s, PlantLoadFailed failed)
    {
        // The located line starts with the path as given; the file name says enough on a status line.
        string problem = failed.Problem.StartsWith(failed.Path + ":", StringComparison.Ordinal)
            ? Path.GetFileName(failed.Path) + failed.Problem[failed.Path.Length..]
            : failed.Problem;
        bool reload = s.Session?.Loaded.Plant.Path == failed.Path;
        string words = SafeText.Visible(problem) + (reload ? " (not read again: the version loaded before stays open)" : string.Empty);
        return Update.Done(s with { Message = StatusMessage.Error(words) });
    }

    // "opened x.toml", or for a reload what became of the swept value.
    private static string OpenedWords(PlantLoaded arrived, SweepState sweep)
    {
        string file = SafeText.Visible(Path.GetFileName(arrived.Loaded.Plant.Path));
        if (arrived.Kept is not { } kept)
        {
            return "opened " + file;
        }

        string was = $"{kept.Parameter} = {NumberText.Exact(kept.Value)}";
        if (kept.Parameter != sweep.Name)
        {
            return $"read {file} again; it now sweeps {sweep.Name}, not {kept.Parameter}, so {was} was not kept";
        }

        return sweep.Unsaved
            ? $"read {file} again; kept {was}, not saved yet (the file has {NumberText.Exact(sweep.SavedValue)})"
            : $"read {file} again; it has {was} too";
    }

    public static (WorkbenchState, ImmutableArray<Effect>) LocusTraced(WorkbenchState s, LocusAnalysis analysis)
    {
        if (s.Session is not { } session)
        {
            return Update.Done(s);
        }

        var cache = session.Cache.With(analysis);
        bool current = analysis.Key.Equals(CurrentKey(session));
        return Update.Done(s with
        {
            Session = session with { Cache = cache, Locus = current ? analysis : session.Locus },
        });
    }

    public static (WorkbenchState, ImmutableArray<Effect>) BandChecked(WorkbenchState s, BandCheck check)
    {
        if (s.Session is not { } session)
        {
            return Update.Done(s);
        }

        bool current = check.SweptValue == session.Sweep.Value;
        return Update.Done(s with
        {
            Session = session with { Checks = session.Checks.With(check.SweptValue, check), Check = current ? check : session.Check },
        });
    }

    public static (WorkbenchState, ImmutableArray<Effect>) ResponseSimulated(WorkbenchState s, ResponseView response)
    {
        if (s.Session is not { } session)
        {
            return Update.Done(s);
        }

        bool current = response.Key.Equals(session.ResponseKey);
        return Update.Done(s with
        {
            Session = session with
            {
                Responses = session.Responses.With(response.Key, response),
                Response = current || session.Response is null ? response : session.Response,
            },
        });
    }

    public static (WorkbenchState, ImmutableArray<Effect>) LocusTraceFailed(WorkbenchState s, LocusTraceFailed failed) =>
        Update.Done(s with { Message = StatusMessage.Error("could not trace the locus: " + SafeText.Visible(failed.Problem)) });

    public static (WorkbenchState, ImmutableArray<Effect>) LibraryScanned(WorkbenchState s, LibraryScanned scanned)
    {
        if (scanned.Folder != s.Library.Folder)
        {
            return Update.Done(s);
        }

        var library = s.Library with { Items = scanned.Items, Scanned = true };
        var overlay = s.Overlay switch
        {
            LibraryOverlay open => new LibraryOverlay(Math.Clamp(open.Selected, 0, Math.Max(0, scanned.Items.Length - 1))),
            NoOverlay when s.Session is null => new LibraryOverlay(0),
            _ => s.Overlay,
        };
        var message = scanned.Problem is null ? s.Message : StatusMessage.Error(SafeText.Visible(scanned.Problem));
        return Update.Done(s with { Library = library, Overlay = overlay, Message = message });
    }

    public static (WorkbenchState, ImmutableArray<Effect>) Saved(WorkbenchState s, OperatingPointSaved saved)
    {
        if (s.Session is not { } session)
        {
            return saved.QuitAfter ? (s, [new QuitEffect()]) : Update.Done(s);
        }

        string before = session.Loaded.Plant.Path;
        var updated = session with
        {
            Loaded = session.Loaded with { Plant = saved.Plant, Document = saved.Document },
            Sweep = session.Sweep with { SavedValue = saved.Value },
            Disk = FileOnDisk.AsLoaded,
            SaveAsSuggestion = null,
            SaveInFlight = false,
        };
        string file = SafeText.Visible(Path.GetFileName(saved.Plant.Path));
        string what = $"saved {session.Sweep.Name} = {NumberText.Exact(saved.Value)} to {file}";
        var effects = ImmutableArray.CreateBuilder<Effect>();
        effects.AddRange(Recovering.AfterSave(session, saved.Plant.Path));
        if (saved.Plant.Path != before)
        {
            updated = MovedTo(s, session, updated, effects);
            what += ", now the open file";
        }
        else if (effects.Count > 0)
        {
            what += " and deleted its recovery file";
        }

        var state = s with { Session = updated, Message = StatusMessage.Info(what) };
        if (saved.QuitAfter)
        {
            effects.Add(new QuitEffect());
        }

        return (state, effects.ToImmutable());
    }

    // Saved under another name: that file is the one open now, and the library has one more file. Results are keyed by
    // the file; the locus is the same loop's, so it is kept under the new name rather than traced again.
    private static PlantSession MovedTo(WorkbenchState s, PlantSession before, PlantSession moved, ImmutableArray<Effect>.Builder effects)
    {
        if (before.LocusIsCurrent && before.CurrentLoop is null)
        {
            moved = moved with { Locus = before.Locus! with { Key = moved.Loop.Key } };
        }

        var (rekeyed, recomputed) = Recompute.Session(moved, s.ShowsResponse);
        effects.AddRange(recomputed);
        if (s.Library.Folder is { } folder)
        {
            effects.Add(new ScanLibraryEffect(folder));
        }

        return rekeyed;
    }

    /// <summary>The trace inputs of what the session shows now (the varied parameter at its place in the band).</summary>
    public static TraceKey CurrentKey(PlantSession session) => session.Loop.Key;
}
