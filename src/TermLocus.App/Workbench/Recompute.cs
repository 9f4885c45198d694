using System.Collections.Immutable;

namespace TermLocus.App.Workbench;

/// <summary>
/// Brings a session's derived figures up to date after the swept value or the varied parameter moved: the poles
/// (always, cheap), the band check and trails (only when the swept value or the varied parameter changed), the
/// per-pole band figures, and the locus (from the cache, else a trace effect while the last one stays on screen).
/// </summary>
internal static class Recompute
{
    /// <summary>The session brought up to date, and the trace to run when the loop's locus is not cached.</summary>
    public static (PlantSession Session, ImmutableArray<Effect> Effects) Session(PlantSession session)
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
        return Locus(updated);
    }

    private static (PlantSession, ImmutableArray<Effect>) Locus(PlantSession session)
    {
        var loop = session.Loop;
        if (session.LocusIsCurrent)
        {
            return (session, []);
        }

        if (session.Cache.Find(loop.Key) is { } cached)
        {
            return (session with { Locus = cached }, []);
        }

        if (loop.Key.Equals(session.RequestedTrace))
        {
            return (session, []);
        }

        var family = ReferenceEquals(loop.Family, session.Loaded.Family) ? null : loop.Family;
        return (session with { RequestedTrace = loop.Key }, [new TraceLocusEffect(session.Loaded, loop.Key, family)]);
    }
}
