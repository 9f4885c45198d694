using System.Collections.Immutable;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>Saving the chosen value and the ways out: quit, quit after a question, quit at once.</summary>
internal static class Saving
{
    /// <summary>
    /// Opens the save dialog with the default name and note (and looks at the file on disk again), unless there is
    /// nothing to save; when the file is known to have changed on disk or to be gone, offers the choice instead.
    /// </summary>
    public static (WorkbenchState, ImmutableArray<Effect>) OpenDialog(WorkbenchState s)
    {
        if (s.Session is not { } session)
        {
            return Update.NoPlant(s);
        }

        if (session.Disk != FileOnDisk.AsLoaded)
        {
            return FileConflicts.Offer(s, DefaultName(session.Sweep), SaveOverlay.DefaultNote, quitAfter: false);
        }

        if (!session.Unsaved)
        {
            return NothingToSave(s, session.Sweep);
        }

        var dialog = new SaveOverlay(DefaultName(session.Sweep), SaveOverlay.DefaultNote, NoteField: false);
        return (s with { Overlay = dialog }, FileConflicts.CheckEffects(session));
    }

    /// <summary>"Kp = 3.2": the name an operating point gets when none is typed.</summary>
    public static string DefaultName(SweepState sweep) => $"{sweep.Name} = {NumberText.Exact(sweep.Value)}";

    /// <summary>
    /// Saves the swept value: into the plant file (skipped when nothing changed; the choice is offered instead when
    /// the file is known to have changed on disk or to be gone), or as <paramref name="mode"/> says.
    /// </summary>
    public static (WorkbenchState, ImmutableArray<Effect>) Save(
        WorkbenchState s, bool quitAfter, string? name = null, string? note = null, SaveMode mode = SaveMode.IntoPlantFile, string? target = null)
    {
        if (s.Session is not { } session)
        {
            return quitAfter ? (s, [new QuitEffect()]) : Update.NoPlant(s);
        }

        var sweep = session.Sweep;
        string chosenName = string.IsNullOrWhiteSpace(name) ? DefaultName(sweep) : name.Trim();
        string chosenNote = string.IsNullOrWhiteSpace(note) ? SaveOverlay.DefaultNote : note.Trim();
        if (mode == SaveMode.IntoPlantFile && session.Disk != FileOnDisk.AsLoaded)
        {
            return FileConflicts.Offer(s, chosenName, chosenNote, quitAfter);
        }

        if (mode == SaveMode.IntoPlantFile && !session.Unsaved)
        {
            // Nothing changed: skip the write, leave the file's bytes alone.
            return quitAfter ? (s, [new QuitEffect()]) : NothingToSave(s, sweep);
        }

        string where = target is null ? string.Empty : " to " + SafeText.Visible(Path.GetFileName(target));
        var save = new SaveOperatingPointEffect(session.Loaded, sweep.Value, Verdict(session), quitAfter, chosenName, chosenNote)
        {
            Mode = mode,
            TargetPath = target,
        };
        return (s with
        {
            Session = session with { SaveInFlight = true },
            Message = StatusMessage.Info($"saving {sweep.Name} = {NumberText.Exact(sweep.Value)}{where}"),
        }, [save]);
    }

    public static (WorkbenchState, ImmutableArray<Effect>) Quit(WorkbenchState s) =>
        s.Unsaved ? Update.Done(s with { Overlay = new QuitConfirmOverlay() }) : (s, [new QuitEffect()]);

    public static (WorkbenchState, ImmutableArray<Effect>) QuitNow(WorkbenchState s)
    {
        if (s.Session is { Unsaved: true } session)
        {
            return (s, [new SaveRecoveryEffect(session.Loaded, session.Sweep.Value, Verdict(session)), new QuitEffect()]);
        }

        return (s, [new QuitEffect()]);
    }

    /// <summary>
    /// The verdict saved with the value: the band-wide one (as <c>termlocus check</c> words it, ASCII symbols) when the
    /// band check for the value is at hand; null when it is not, so the save computes it; the poles' own verdict for
    /// a plant without a loop model.
    /// </summary>
    public static string? Verdict(PlantSession session)
    {
        if (session.Loaded.Model is null)
        {
            return SpecWording.Verdict(session.Poles, Glyphs.Ascii);
        }

        var check = session.Check ?? session.Checks.Find(session.Sweep.Value);
        return check is { Result: not null } && check.SweptValue == session.Sweep.Value ? SaveVerdict.Of(check) : null;
    }

    private static (WorkbenchState, ImmutableArray<Effect>) NothingToSave(WorkbenchState s, SweepState sweep) =>
        Update.Say(s, StatusMessage.Info($"nothing to save: {sweep.Name} = {NumberText.Exact(sweep.Value)} is the value in the file"));
}
