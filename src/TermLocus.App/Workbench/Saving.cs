using System.Collections.Immutable;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>Saving the chosen value and the ways out: quit, quit after a question, quit at once.</summary>
internal static class Saving
{
    public static (WorkbenchState, ImmutableArray<Effect>) Save(WorkbenchState s, bool quitAfter)
    {
        if (s.Session is not { } session)
        {
            return quitAfter ? (s, [new QuitEffect()]) : Update.NoPlant(s);
        }

        var sweep = session.Sweep;
        if (!session.Unsaved)
        {
            // Nothing changed: skip the write, leave the file's bytes alone.
            return quitAfter
                ? (s, [new QuitEffect()])
                : Update.Say(s, StatusMessage.Info($"nothing to save: {sweep.Name} = {NumberText.Exact(sweep.Value)} is the value in the file"));
        }

        string verdict = SpecWording.Verdict(session.Poles, Glyphs.Unicode);
        return (s with { Message = StatusMessage.Info($"saving {sweep.Name} = {NumberText.Exact(sweep.Value)}") },
            [new SaveOperatingPointEffect(session.Loaded, sweep.Value, verdict, quitAfter)]);
    }

    public static (WorkbenchState, ImmutableArray<Effect>) Quit(WorkbenchState s) =>
        s.Unsaved ? Update.Done(s with { Overlay = new QuitConfirmOverlay() }) : (s, [new QuitEffect()]);

    public static (WorkbenchState, ImmutableArray<Effect>) QuitNow(WorkbenchState s)
    {
        if (s.Session is { Unsaved: true } session)
        {
            string verdict = SpecWording.Verdict(session.Poles, Glyphs.Unicode);
            return (s, [new SaveRecoveryEffect(session.Loaded, session.Sweep.Value, verdict), new QuitEffect()]);
        }

        return (s, [new QuitEffect()]);
    }
}
