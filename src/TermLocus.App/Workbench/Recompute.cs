using System.Collections.Immutable;

namespace TermLocus.App.Workbench;

/// <summary>
/// Brings a session's derived figures up to date after the swept value or the varied parameter moved: the poles
/// (always, cheap), the trails and per-pole band figures (cheap), and from their caches or as effects off the UI
/// thread the band check, the step response (when shown) and the locus; what is being recomputed stays on screen
/// until its replacement arrives, except the band verdict, which says it is being checked.
/// </summary>
internal static class Recompute
{
    /// <summary>The session brought up to date, and the effects that fill in what is not cached.</summary>
    /// <param name="session">The session with its new swept value or varied position.</param>
    /// <param name="withResponse">True when the step response is on screen and must follow.</param>
    public static (PlantSession Session, ImmutableArray<Effect> Effects) Session(PlantSession session, bool withResponse)
    {
        var sweep = session.Sweep;
        var band = session.Band is { } b && b.SweptValue == sweep.Value && b.Parameter == session.Varied.Parameter
            ? b
            : CoreBridge.BandAt(session.Loaded, sweep.Value, session.Varied);
        var poles = CoreBridge.PolesAt(session.Loaded, session.Loop, sweep.Value);
        poles = poles with
        {
            BandFigures = CoreBridge.BandFigures(poles, band, session.Varied),
            VariedParameter = session.Varied.Parameter,
        };
        int rows = PoleRows.Group(poles.Poles, poles.Plane).Length;
        var updated = session with
        {
            Band = band,
            Poles = poles,
            SelectedPole = Math.Clamp(session.SelectedPole, 0, Math.Max(0, rows - 1)),
        };
        var effects = ImmutableArray.CreateBuilder<Effect>();
        updated = Locus(updated, effects);
        updated = Check(updated, effects);
        if (withResponse)
        {
            updated = Response(updated, effects);
        }

        return (updated, effects.ToImmutable());
    }

    private static PlantSession Locus(PlantSession session, ImmutableArray<Effect>.Builder effects)
    {
        var loop = session.Loop;
        if (session.LocusIsCurrent)
        {
            return session;
        }

        if (session.Cache.Find(loop.Key) is { } cached)
        {
            return session with { Locus = cached };
        }

        if (loop.Key.Equals(session.RequestedTrace))
        {
            return session;
        }

        var family = ReferenceEquals(loop.Family, session.Loaded.Family) ? null : loop.Family;
        effects.Add(new TraceLocusEffect(session.Loaded, loop.Key, family));
        return session with { RequestedTrace = loop.Key };
    }

    private static PlantSession Check(PlantSession session, ImmutableArray<Effect>.Builder effects)
    {
        double value = session.Sweep.Value;
        if (session.Check?.SweptValue == value || session.Loaded.Model is null)
        {
            return session;
        }

        if (session.Checks.Find(value) is { } cached)
        {
            return session with { Check = cached };
        }

        if (session.RequestedCheck != value)
        {
            effects.Add(new CheckBandEffect(session.Loaded, value));
        }

        return session with { Check = null, RequestedCheck = value };
    }

    private static PlantSession Response(PlantSession session, ImmutableArray<Effect>.Builder effects)
    {
        var key = session.ResponseKey;
        if (session.ResponseIsCurrent)
        {
            return session;
        }

        if (session.Responses.Find(key) is { } cached)
        {
            return session with { Response = cached };
        }

        if (!key.Equals(session.RequestedResponse))
        {
            effects.Add(new SimulateResponseEffect(session.Loaded, session.Loop.Values, key));
        }

        return session with { RequestedResponse = key };
    }
}
