using System.Collections.Immutable;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>What the workbench does when an effect's outcome arrives.</summary>
internal static class Arrivals
{
    public static (WorkbenchState, ImmutableArray<Effect>) PlantLoaded(WorkbenchState s, LoadedPlant loaded)
    {
        var plant = loaded.Plant;
        var parameter = plant.SweptParameter;
        var sweep = new SweepState(
            parameter.Name, parameter.Unit, parameter.Value, parameter.Value, StepSeries.Initial(loaded.Range.Width), loaded.Range);
        var cache = s.Session?.Cache ?? LocusCache.Empty;
        var opened = new PlantSession(
            loaded, sweep, VariedPosition.First(plant), null, cache, CoreBridge.PolesAt(loaded, sweep.Value), 0);
        var (session, effects) = Recompute.Session(opened, s.ShowsResponse);
        var state = s with
        {
            Session = session,
            View = ViewState.Fitted,
            Overlay = s.Overlay is LibraryOverlay ? Overlay.None : s.Overlay,
            Message = StatusMessage.Info("opened " + SafeText.Visible(Path.GetFileName(plant.Path))),
        };
        return loaded.Model is null ? (state, effects) : (state, effects.Add(new DesignEffect(loaded)));
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

        var updated = session with
        {
            Loaded = session.Loaded with { Plant = saved.Plant, Document = saved.Document },
            Sweep = session.Sweep with { SavedValue = saved.Value },
        };
        string file = SafeText.Visible(Path.GetFileName(saved.Plant.Path));
        var state = s with
        {
            Session = updated,
            Message = StatusMessage.Info($"saved {session.Sweep.Name} = {NumberText.Exact(saved.Value)} to {file}"),
        };
        return saved.QuitAfter ? (state, [new QuitEffect()]) : (state, []);
    }

    /// <summary>The trace inputs of what the session shows now (the varied parameter at its place in the band).</summary>
    public static TraceKey CurrentKey(PlantSession session) => session.Loop.Key;
}
