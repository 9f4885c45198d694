using System.Collections.Immutable;

namespace TermLocus.App.Workbench;

// Switches over our enums list every named value and have no default arm, so a new value breaks the build (CS8509);
// values outside the enum (CS8524) cannot occur.
#pragma warning disable CS8524

/// <summary>
/// The one key table. Help, status-line hints and the command line's key list are generated from it; the terminal
/// layer installs it in one place. Plain keys for everything: no action needs Shift, Ctrl or Alt with an arrow.
/// </summary>
public static class KeyMap
{
    /// <summary>Every binding, in the order help lists them.</summary>
    public static ImmutableArray<KeyBinding> Bindings { get; } = Build();

    /// <summary>The scopes searched for a key in <paramref name="state"/>, most specific first.</summary>
    public static ImmutableArray<Scope> ActiveScopes(WorkbenchState state) => state.Overlay switch
    {
        HelpOverlay => [Scope.Help, Scope.Everywhere],
        LibraryOverlay => [Scope.Library, Scope.Everywhere],
        ValueEntryOverlay => [Scope.ValueEntry, Scope.Everywhere],
        SaveOverlay => [Scope.SaveDialog, Scope.Everywhere],
        SaveConflictOverlay => [Scope.SaveConflict, Scope.Everywhere],
        SaveAsOverlay => [Scope.SaveAs, Scope.Everywhere],
        RecoveryOverlay => [Scope.Recovery, Scope.Everywhere],
        QuitConfirmOverlay => [Scope.QuitConfirm, Scope.Everywhere],
        _ => [PaneScope(state.Focus), Scope.Main, Scope.Everywhere],
    };

    /// <summary>The command <paramref name="key"/> means in <paramref name="state"/>, or null when it means nothing.</summary>
    public static Command? Lookup(WorkbenchState state, KeyChord key)
    {
        foreach (var scope in ActiveScopes(state))
        {
            foreach (var binding in Bindings)
            {
                if (binding.Scope == scope && binding.Key == key)
                {
                    return binding.Command;
                }
            }
        }

        return null;
    }

    /// <summary>True when printable keys not in the table are text for a box on top (value, save name, file name).</summary>
    public static bool TypesText(WorkbenchState state) => state.Overlay is ValueEntryOverlay or SaveOverlay or SaveAsOverlay;

    /// <summary>The keys bound to <paramref name="command"/> in <paramref name="scope"/>, in table order.</summary>
    public static ImmutableArray<KeyChord> KeysFor(Command command, Scope scope) =>
        Bindings.Where(b => b.Command == command && b.Scope == scope).Select(b => b.Key).ToImmutableArray();

    /// <summary>The scope of the pane that has focus.</summary>
    public static Scope PaneScope(Pane pane) => pane switch
    {
        Pane.Plane => Scope.PlanePane,
        Pane.Poles => Scope.PolesPane,
    };

    private static ImmutableArray<KeyBinding> Build()
    {
        var table = ImmutableArray.CreateBuilder<KeyBinding>();
        void Bind(Scope scope, Command command, string description, params KeyChord[] keys)
        {
            foreach (var key in keys)
            {
                table.Add(new KeyBinding(key, command, scope, description));
            }
        }

        BindMain(Bind);
        BindPanesAndOverlays(Bind);
        return table.ToImmutable();
    }

    private static KeyChord K(char c) => KeyChord.Of(c);

    private static KeyChord S(SpecialKey k) => KeyChord.Of(k);

    private static void BindMain(Action<Scope, Command, string, KeyChord[]> bind)
    {
        void Bind(Command command, string description, params KeyChord[] keys) => bind(Scope.Main, command, description, keys);
        Bind(Command.StepSweepDown, "step the swept value down", S(SpecialKey.Left), K('h'));
        Bind(Command.StepSweepUp, "step the swept value up", S(SpecialKey.Right), K('l'));
        Bind(Command.FinerStep, "finer step", K('['), K('-'));
        Bind(Command.CoarserStep, "coarser step", K(']'), K('+'));
        Bind(Command.StepBandUp, "move the varied parameter up its band (one band step)", S(SpecialKey.Up), K('k'));
        Bind(Command.StepBandDown, "move the varied parameter down its band", S(SpecialKey.Down), K('j'));
        Bind(Command.FinerBandStep, "finer band step: 1/20, 1/50, 1/100 of the band", K('{'), K('<'));
        Bind(Command.CoarserBandStep, "coarser band step: 1/5, 1/2 of the band", K('}'), K('>'));
        Bind(Command.BandToNominal, "varied parameter back to nominal", K('0'));
        Bind(Command.NextVariedParameter, "vary the next toleranced parameter", K('v'));
        Bind(Command.JumpToRangeStart, "go to the start of the range", S(SpecialKey.Home), K('g'));
        Bind(Command.JumpToRangeEnd, "go to the end of the range", S(SpecialKey.End), K('G'));
        Bind(Command.EnterValue, "type an exact value", K('='), S(SpecialKey.Enter));
        Bind(Command.JumpToRecommended, "go to the recommended value (widest feasible interval)", K('d'));
        Bind(Command.JumpToPreviousBoundary, "previous spec boundary, crossing or band limit", K('p'), S(SpecialKey.PageUp));
        Bind(Command.JumpToNextBoundary, "next spec boundary, crossing or band limit", K('n'), S(SpecialKey.PageDown));
        Bind(Command.ZoomIn, "zoom in", K('z'));
        Bind(Command.ZoomOut, "zoom out", K('Z'));
        Bind(Command.FitView, "fit the view to the locus", K('f'));
        Bind(Command.PanLeft, "pan left", K('H'));
        Bind(Command.PanDown, "pan down", K('J'));
        Bind(Command.PanUp, "pan up", K('K'));
        Bind(Command.PanRight, "pan right", K('L'));
        Bind(Command.ToggleResponse, "show or hide the step response", K('t'));
        Bind(Command.NextPane, "next pane", S(SpecialKey.Tab));
        Bind(Command.OpenLibrary, "open the plant library", K('o'));
        Bind(Command.SaveOperatingPoint, "save the value into the plant file", K('s'));
        Bind(Command.RevertToSavedValue, "back to the saved value", K('r'));
        Bind(Command.ShowHelp, "help", K('?'));
        Bind(Command.Quit, "quit", K('q'));
        Bind(Command.Cancel, "clear the message (Esc never quits)", S(SpecialKey.Escape));
    }

    private static void BindPanesAndOverlays(Action<Scope, Command, string, KeyChord[]> bind)
    {
        bind(Scope.PolesPane, Command.MoveUp, "select the previous pole", [S(SpecialKey.Up), K('k')]);
        bind(Scope.PolesPane, Command.MoveDown, "select the next pole", [S(SpecialKey.Down), K('j')]);

        bind(Scope.Help, Command.MoveUp, "scroll up", [S(SpecialKey.Up), K('k'), S(SpecialKey.PageUp)]);
        bind(Scope.Help, Command.MoveDown, "scroll down", [S(SpecialKey.Down), K('j'), S(SpecialKey.PageDown)]);
        bind(Scope.Help, Command.Cancel, "close the help", [S(SpecialKey.Escape), K('?'), K('q'), S(SpecialKey.Enter)]);

        bind(Scope.Library, Command.MoveUp, "previous file", [S(SpecialKey.Up), K('k')]);
        bind(Scope.Library, Command.MoveDown, "next file", [S(SpecialKey.Down), K('j')]);
        bind(Scope.Library, Command.Confirm, "open the file", [S(SpecialKey.Enter), S(SpecialKey.Right), K('l')]);
        bind(Scope.Library, Command.Cancel, "close the library", [S(SpecialKey.Escape), K('q'), K('o')]);

        bind(Scope.ValueEntry, Command.Confirm, "set the value", [S(SpecialKey.Enter)]);
        bind(Scope.ValueEntry, Command.DeleteBackward, "delete a character", [S(SpecialKey.Backspace)]);
        bind(Scope.ValueEntry, Command.Cancel, "cancel", [S(SpecialKey.Escape)]);

        bind(Scope.SaveDialog, Command.Confirm, "save with this name and note", [S(SpecialKey.Enter)]);
        bind(Scope.SaveDialog, Command.NextPane, "next field", [S(SpecialKey.Tab), S(SpecialKey.Down)]);
        bind(Scope.SaveDialog, Command.MoveUp, "previous field", [S(SpecialKey.Up)]);
        bind(Scope.SaveDialog, Command.DeleteBackward, "delete a character", [S(SpecialKey.Backspace)]);
        bind(Scope.SaveDialog, Command.Cancel, "cancel, nothing is written", [S(SpecialKey.Escape)]);

        bind(Scope.SaveConflict, Command.ReloadFromDisk, "read the file again from disk, keeping the swept value", [K('r')]);
        bind(Scope.SaveConflict, Command.SaveUnderAnotherName, "save under another name (a new file)", [K('a')]);
        bind(Scope.SaveConflict, Command.WriteFileAgain, "write the file again where it was (when it is gone)", [K('w')]);
        bind(Scope.SaveConflict, Command.Cancel, "cancel, nothing is written", [S(SpecialKey.Escape), K('c')]);

        bind(Scope.SaveAs, Command.Confirm, "save into this new file", [S(SpecialKey.Enter)]);
        bind(Scope.SaveAs, Command.DeleteBackward, "delete a character", [S(SpecialKey.Backspace)]);
        bind(Scope.SaveAs, Command.Cancel, "cancel, nothing is written", [S(SpecialKey.Escape)]);

        bind(Scope.Recovery, Command.ApplyRecovery, "apply its value, unsaved until you save", [K('a')]);
        bind(Scope.Recovery, Command.DiscardRecovery, "discard it (delete the recovery file)", [K('d')]);
        bind(Scope.Recovery, Command.Cancel, "keep it for later (offered again next time)", [K('k'), S(SpecialKey.Escape)]);

        bind(Scope.QuitConfirm, Command.SaveAndQuit, "save, then quit", [K('s'), K('y')]);
        bind(Scope.QuitConfirm, Command.DiscardAndQuit, "quit without saving", [K('d'), K('n')]);
        bind(Scope.QuitConfirm, Command.Cancel, "keep working", [S(SpecialKey.Escape), K('c')]);

        bind(Scope.Everywhere, Command.QuitNow, "quit at once, keeping an unsaved value in a recovery file", [KeyChord.CtrlOf('c')]);
    }
}
