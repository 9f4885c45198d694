using System.Collections.Immutable;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>
/// A recovery file found beside a plant on opening: apply its value (unsaved until the user saves), discard it
/// (delete the file), or keep it for later. A broken or out-of-date one is said to be so; nothing is applied unasked.
/// </summary>
internal static class Recovering
{
    /// <summary>The opened state with the recovery choice on top.</summary>
    public static WorkbenchState Offer(WorkbenchState s, RecoveryFile file) => s with
    {
        Overlay = new RecoveryOverlay(file),
        Message = StatusMessage.Warning(!file.CanApply ? $"found {Name(file)}; it cannot be applied"
            : file.Stale ? $"found {Name(file)}, older than the plant file"
            : $"found {Name(file)} (an unsaved value from last time)"),
    };

    public static (WorkbenchState, ImmutableArray<Effect>) Apply(WorkbenchState s)
    {
        if (s.Overlay is not RecoveryOverlay { File: var file } || s.Session is not { } session)
        {
            return Update.Done(s);
        }

        if (!file.CanApply)
        {
            return Update.Say(s, StatusMessage.Warning($"{Name(file)} cannot be applied: {SafeText.Visible(file.Problem ?? "it holds no value")}"));
        }

        var sweep = session.Sweep;
        double value = file.Value!.Value;
        if (value == sweep.SavedValue)
        {
            // Nothing to apply; the choice stays open so the file can be discarded or kept.
            return Update.Say(s, StatusMessage.Info(
                $"{sweep.Name} = {NumberText.Exact(value)} is already the file's value: d deletes the recovery file, k keeps it"));
        }

        string words = $"{sweep.Name} = {NumberText.Exact(value)} from the recovery file, not saved yet: s saves it, r goes back to {NumberText.Exact(sweep.SavedValue)}";
        var applied = s with { Overlay = Overlay.None, Session = session with { AppliedRecovery = file.Path } };
        return Sweeping.SetValue(applied, value, StatusMessage.Info(words));
    }

    public static (WorkbenchState, ImmutableArray<Effect>) Discard(WorkbenchState s) => s.Overlay is RecoveryOverlay { File: var file }
        ? (s with { Overlay = Overlay.None, Message = StatusMessage.Info($"deleting {Name(file)}") }, [new DeleteRecoveryEffect(file.Path)])
        : Update.Done(s);

    public static (WorkbenchState, ImmutableArray<Effect>) Keep(WorkbenchState s, RecoveryOverlay overlay) => Update.Done(s with
    {
        Overlay = Overlay.None,
        Message = StatusMessage.Info($"kept {Name(overlay.File)} for later"),
    });

    public static (WorkbenchState, ImmutableArray<Effect>) Deleted(WorkbenchState s, RecoveryDeleted deleted)
    {
        string name = SafeText.Visible(Path.GetFileName(deleted.Path));
        var session = s.Session;
        bool afterSave = session?.AppliedRecovery == deleted.Path;
        var state = afterSave ? s with { Session = session! with { AppliedRecovery = null } } : s;
        if (deleted.Problem is { } problem)
        {
            return Update.Done(state with { Message = StatusMessage.Error($"could not delete {name}: {SafeText.Visible(problem)}") });
        }

        // After a save the "saved" message says it all; the deletion is only news when it was asked for.
        return Update.Done(afterSave ? state : state with { Message = StatusMessage.Info($"deleted {name}") });
    }

    /// <summary>The effect deleting the applied recovery file once its value is saved into its own plant file.</summary>
    public static ImmutableArray<Effect> AfterSave(PlantSession session, string savedPath) =>
        session.AppliedRecovery is { } recovery && recovery == SaveRecoveryEffect.RecoveryPathFor(savedPath)
            ? [new DeleteRecoveryEffect(recovery)]
            : [];

    private static string Name(RecoveryFile file) => SafeText.Visible(Path.GetFileName(file.Path));
}
