using System.Collections.Immutable;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>
/// The key hints of the status line, generated from <see cref="KeyMap"/>: for each hint, the first key of each of
/// its commands and a short label. Hints that do not fit are dropped by priority, help and quit last.
/// </summary>
public static class KeyHints
{
    /// <summary>The hint line for what is on top in <paramref name="state"/>, at most <paramref name="width"/> columns.</summary>
    public static string Line(WorkbenchState state, int width, Glyphs glyphs)
    {
        var (scope, hints) = HintsFor(state);
        if (state.Session?.Varied.Parameter is null)
        {
            // Nothing to step through: the band hint would only take room.
            hints = hints.RemoveAll(h => h.Commands.Contains(Command.StepBandUp) || h.Commands.Contains(Command.FinerBandStep));
        }

        hints = hints.RemoveAll(h => !Offered(state, h));

        if (state.Session is { Loaded.Model: null })
        {
            // A plant built without a loop model (tests, scripts) has no design to jump to.
            hints = hints.RemoveAll(h => h.Commands.Contains(Command.JumpToRecommended));
        }

        var texts = hints.Select(h => (h.Priority, Text: Render(h, scope, glyphs))).ToList();
        var kept = new HashSet<int>();
        int used = 0;
        foreach (var (item, index) in texts.Select((t, i) => (t, i)).OrderBy(p => p.t.Priority))
        {
            int cost = TextWidth.Of(item.Text) + (kept.Count > 0 ? 2 : 0);
            if (used + cost <= width)
            {
                kept.Add(index);
                used += cost;
            }
        }

        return string.Join("  ", texts.Where((_, i) => kept.Contains(i)).Select(t => t.Text));
    }

    // Choices that do not apply to what happened are not offered (nothing to read again when the file is gone).
    private static bool Offered(WorkbenchState state, Hint hint) => state.Overlay switch
    {
        SaveConflictOverlay { Reason: FileOnDisk.Missing } => !hint.Commands.Contains(Command.ReloadFromDisk),
        SaveConflictOverlay => !hint.Commands.Contains(Command.WriteFileAgain),
        RecoveryOverlay { File: var file } when !file.CanApply || file.Value == state.Session?.Sweep.SavedValue =>
            !hint.Commands.Contains(Command.ApplyRecovery),
        _ => true,
    };

    private static string Render(Hint hint, Scope scope, Glyphs glyphs)
    {
        var keys = hint.Commands.Select(c => FirstKey(c, scope)).Where(k => k is not null).Select(k => k!.Value.Name(glyphs));
        return string.Join("/", keys) + " " + hint.Label;
    }

    private static KeyChord? FirstKey(Command command, Scope scope)
    {
        var keys = KeyMap.KeysFor(command, scope);
        return keys.IsEmpty ? null : keys[0];
    }

    private static (Scope Scope, ImmutableArray<Hint> Hints) HintsFor(WorkbenchState state) => state.Overlay switch
    {
        HelpOverlay => (Scope.Help, [new([Command.MoveUp, Command.MoveDown], "scroll", 1), new([Command.Cancel], "close", 0)]),
        LibraryOverlay => (Scope.Library,
        [
            new([Command.MoveUp, Command.MoveDown], "choose", 1),
            new([Command.Confirm], "open", 0),
            new([Command.Cancel], "close", 0),
        ]),
        ValueEntryOverlay => (Scope.ValueEntry,
        [
            new([Command.Confirm], "set", 0),
            new([Command.Cancel], "cancel", 0),
            new([Command.DeleteBackward], "delete", 1),
        ]),
        SaveOverlay => (Scope.SaveDialog,
        [
            new([Command.Confirm], "save", 0),
            new([Command.NextPane], "next field", 1),
            new([Command.Cancel], "cancel", 0),
        ]),
        SaveConflictOverlay => (Scope.SaveConflict,
        [
            new([Command.ReloadFromDisk], "read it again", 0),
            new([Command.SaveUnderAnotherName], "save under another name", 0),
            new([Command.WriteFileAgain], "write it again", 0),
            new([Command.Cancel], "cancel", 0),
        ]),
        SaveAsOverlay => (Scope.SaveAs,
        [
            new([Command.Confirm], "save", 0),
            new([Command.Cancel], "cancel", 0),
            new([Command.DeleteBackward], "delete", 1),
        ]),
        RecoveryOverlay => (Scope.Recovery,
        [
            new([Command.ApplyRecovery], "apply", 0),
            new([Command.DiscardRecovery], "discard", 0),
            new([Command.Cancel], "keep for later", 0),
        ]),
        QuitConfirmOverlay => (Scope.QuitConfirm,
        [
            new([Command.SaveAndQuit], "save and quit", 0),
            new([Command.DiscardAndQuit], "quit without saving", 0),
            new([Command.Cancel], "keep working", 0),
        ]),
        _ => (Scope.Main, MainHints),
    };

    private static readonly ImmutableArray<Hint> MainHints =
    [
        new([Command.StepSweepDown, Command.StepSweepUp], "step", 2),
        new([Command.StepBandUp, Command.StepBandDown], "band", 3),
        new([Command.FinerStep, Command.CoarserStep], "step size", 6),
        new([Command.FinerBandStep, Command.CoarserBandStep], "band step", 8),
        new([Command.EnterValue], "value", 3),
        new([Command.JumpToPreviousBoundary, Command.JumpToNextBoundary], "boundary", 6),
        new([Command.JumpToRecommended], "design", 4),
        new([Command.ZoomIn, Command.ZoomOut], "zoom", 7),
        new([Command.FitView], "fit", 8),
        new([Command.ToggleResponse], "response", 4),
        new([Command.NextPane], "pane", 9),
        new([Command.OpenLibrary], "library", 5),
        new([Command.SaveOperatingPoint], "save", 3),
        new([Command.ShowHelp], "help", 0),
        new([Command.Quit], "quit", 1),
    ];

    private sealed record Hint(ImmutableArray<Command> Commands, string Label, int Priority);
}
