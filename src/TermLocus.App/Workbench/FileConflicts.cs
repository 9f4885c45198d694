using System.Collections.Immutable;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

// Switches over our enums list every named value and have no default arm, so a new value breaks the build (CS8509);
// values outside the enum (CS8524) cannot occur.
#pragma warning disable CS8524

/// <summary>
/// When the plant file changed on disk or is gone: noticing it (the terminal layer reports touches, the worker
/// compares hashes), saying so, and the choice a save then offers: read it again keeping the swept value, save under
/// another name, write it again where it was (only when gone), or cancel. Nothing is overwritten without being asked.
/// </summary>
internal static class FileConflicts
{
    /// <summary>Opens the choice for a save that cannot go into the plant file as it is.</summary>
    public static (WorkbenchState, ImmutableArray<Effect>) Offer(WorkbenchState s, string name, string note, bool quitAfter)
    {
        var session = s.Session!;
        var overlay = new SaveConflictOverlay(session.Disk, name, note, quitAfter, Suggestion(session));
        return (s with { Overlay = overlay }, CheckEffects(session));
    }

    /// <summary>The effect that compares the file on disk with the bytes loaded; none for a plant not read from a file.</summary>
    public static ImmutableArray<Effect> CheckEffects(PlantSession session) =>
        session.Loaded.Document is { } document ? [new CheckPlantFileEffect(session.Loaded.Plant.Path, document.Sha256)] : [];

    /// <summary>The file name offered for a save under another name.</summary>
    public static string Suggestion(PlantSession session) =>
        session.SaveAsSuggestion ?? SaveAsNames.Suggest(session.Loaded.Plant.Path, _ => false);

    public static (WorkbenchState, ImmutableArray<Effect>) Touched(WorkbenchState s, PlantFileTouched touched) =>
        s.Session is { } session && session.Loaded.Plant.Path == touched.Path ? (s, CheckEffects(session)) : Update.Done(s);

    public static (WorkbenchState, ImmutableArray<Effect>) Checked(WorkbenchState s, PlantFileChecked check)
    {
        // A check made against bytes since replaced by our own save says nothing about the file now.
        // While our own save runs, the file changes under our hands; its outcome says how the file ends up.
        if (s.Session is not { Loaded.Document: { } document, SaveInFlight: false } session || session.Loaded.Plant.Path != check.Path
            || !document.Sha256.AsSpan().SequenceEqual(check.ExpectedSha256.AsSpan()))
        {
            return Update.Done(s);
        }

        var updated = session with { Disk = check.State, SaveAsSuggestion = check.SuggestedPath };
        bool news = check.State != session.Disk;
        var message = news ? Noticed(session, check.State) : s.Message;
        var state = s with { Session = updated, Message = message };
        // The library pane lists the file and its verdict: read the folder again when the file came or went or changed.
        ImmutableArray<Effect> effects = news && s.Library.Folder is { } folder ? [new ScanLibraryEffect(folder)] : [];
        if (s.Overlay is SaveOverlay dialog && check.State != FileOnDisk.AsLoaded)
        {
            // The save asked for cannot go into the file as it is: the choice replaces the dialog, keeping what was typed.
            var conflict = new SaveConflictOverlay(check.State, dialog.Name, dialog.Note, QuitAfter: false, check.SuggestedPath);
            string what = check.State == FileOnDisk.Missing ? "is gone" : "changed on disk";
            return (state with { Overlay = conflict, Message = StatusMessage.Warning($"not saved: {FileName(session)} {what}") }, effects);
        }

        return (state, effects);
    }

    public static (WorkbenchState, ImmutableArray<Effect>) Refused(WorkbenchState s, SaveRefused refused)
    {
        if (s.Session is not { } session)
        {
            return Update.Done(s);
        }

        var request = refused.Request;
        string name = request.Name ?? Saving.DefaultName(session.Sweep);
        string note = request.Note ?? SaveOverlay.DefaultNote;
        if (refused.Reason == SaveRefusal.TargetExists)
        {
            string target = request.TargetPath ?? refused.SuggestedPath;
            string problem = $"{SafeText.Visible(Path.GetFileName(target))} exists already; type another name";
            return Update.Done(s with
            {
                Session = session with { SaveInFlight = false },
                Overlay = new SaveAsOverlay(target, name, note, request.QuitAfter, problem),
                Message = StatusMessage.Warning("not saved: " + SafeText.Visible(refused.Problem)),
            });
        }

        var disk = refused.Reason == SaveRefusal.FileMissing ? FileOnDisk.Missing : FileOnDisk.Changed;
        var updated = session with { Disk = disk, SaveAsSuggestion = refused.SuggestedPath, SaveInFlight = false };
        return Update.Done(s with
        {
            Session = updated,
            Overlay = new SaveConflictOverlay(disk, name, note, request.QuitAfter, refused.SuggestedPath),
            Message = StatusMessage.Warning($"not saved: {FileName(session)} {(disk == FileOnDisk.Missing ? "is gone" : "changed on disk")}"),
        });
    }

    public static (WorkbenchState, ImmutableArray<Effect>) Reload(WorkbenchState s)
    {
        if (s.Overlay is not SaveConflictOverlay conflict || s.Session is not { } session)
        {
            return Update.Done(s);
        }

        if (conflict.Reason == FileOnDisk.Missing)
        {
            return Update.Say(s, StatusMessage.Warning($"{FileName(session)} is gone, there is nothing to read: a saves under another name"));
        }

        var sweep = session.Sweep;
        return (s with
        {
            Overlay = Overlay.None,
            Message = StatusMessage.Info($"reading {FileName(session)} again, keeping {sweep.Name} = {NumberText.Exact(sweep.Value)}"),
        }, [new LoadPlantEffect(session.Loaded.Plant.Path, new KeptValue(sweep.Name, sweep.Value))]);
    }

    public static (WorkbenchState, ImmutableArray<Effect>) SaveUnderAnotherName(WorkbenchState s) => s.Overlay is SaveConflictOverlay conflict
        ? Update.Done(s with { Overlay = new SaveAsOverlay(conflict.SuggestedPath, conflict.Name, conflict.Note, conflict.QuitAfter, null) })
        : Update.Done(s);

    public static (WorkbenchState, ImmutableArray<Effect>) WriteAgain(WorkbenchState s)
    {
        if (s.Overlay is not SaveConflictOverlay conflict || s.Session is not { } session)
        {
            return Update.Done(s);
        }

        if (conflict.Reason == FileOnDisk.Changed)
        {
            return Update.Say(s, StatusMessage.Warning(
                $"{FileName(session)} is there, changed by another program; it is never overwritten: r reads it again, a saves under another name"));
        }

        return Saving.Save(s with { Overlay = Overlay.None }, conflict.QuitAfter, conflict.Name, conflict.Note, SaveMode.WriteAgain);
    }

    public static (WorkbenchState, ImmutableArray<Effect>) ConfirmSaveAs(WorkbenchState s, SaveAsOverlay box)
    {
        string path = box.Path.Trim();
        string? problem = path.Length == 0 ? "type a file name, e.g. " + SafeText.Visible(Path.GetFileName(s.Session is { } session ? Suggestion(session) : "plant.2.toml"))
            : !SaveAsNames.IsPlantFileName(path) ? "a plant file name ends in .toml (the library lists only those)"
            : null;
        if (problem is not null)
        {
            return Update.Done(s with { Overlay = box with { Problem = problem } });
        }

        return Saving.Save(s with { Overlay = Overlay.None }, box.QuitAfter, box.Name, box.Note, SaveMode.NewFile, path);
    }

    public static (WorkbenchState, ImmutableArray<Effect>) Cancel(WorkbenchState s) =>
        Update.Done(s with { Overlay = Overlay.None, Message = StatusMessage.Info("not saved: nothing was written") });

    /// <summary>Typing and deleting in the file-name box.</summary>
    public static (WorkbenchState, ImmutableArray<Effect>) Edit(WorkbenchState s, SaveAsOverlay box, string path) =>
        Update.Done(s with { Overlay = box with { Path = path, Problem = null } });

    private static StatusMessage Noticed(PlantSession session, FileOnDisk state) => state switch
    {
        FileOnDisk.Changed => StatusMessage.Warning($"{FileName(session)} changed on disk; s lets you choose what to do"),
        FileOnDisk.Missing => StatusMessage.Warning($"{FileName(session)} is gone from disk; s lets you choose what to do"),
        FileOnDisk.AsLoaded => StatusMessage.Info($"{FileName(session)} on disk is again as it was loaded"),
    };

    private static string FileName(PlantSession session) => SafeText.Visible(Path.GetFileName(session.Loaded.Plant.Path));
}
