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

        static KeyChord K(char c) => KeyChord.Of(c);
        static KeyChord S(SpecialKey k) => KeyChord.Of(k);

        Bind(Scope.Main, Command.StepSweepDown, "step the swept value down", S(SpecialKey.Left), K('h'));
        Bind(Scope.Main, Command.StepSweepUp, "step the swept value up", S(SpecialKey.Right), K('l'));
        Bind(Scope.Main, Command.FinerStep, "finer step", K('['), K('-'));
        Bind(Scope.Main, Command.CoarserStep, "coarser step", K(']'), K('+'));
        Bind(Scope.Main, Command.JumpToRangeStart, "go to the start of the range", S(SpecialKey.Home), K('g'));
        Bind(Scope.Main, Command.JumpToRangeEnd, "go to the end of the range", S(SpecialKey.End), K('G'));
        Bind(Scope.Main, Command.EnterValue, "type an exact value", K('='), S(SpecialKey.Enter));
        Bind(Scope.Main, Command.JumpToPreviousBoundary, "previous spec boundary or crossing", K('p'), S(SpecialKey.PageUp));
        Bind(Scope.Main, Command.JumpToNextBoundary, "next spec boundary or crossing", K('n'), S(SpecialKey.PageDown));
        Bind(Scope.Main, Command.ZoomIn, "zoom in", K('z'));
        Bind(Scope.Main, Command.ZoomOut, "zoom out", K('Z'));
        Bind(Scope.Main, Command.FitView, "fit the view to the locus", K('f'));
        Bind(Scope.Main, Command.PanLeft, "pan left", K('H'));
        Bind(Scope.Main, Command.PanDown, "pan down", K('J'));
        Bind(Scope.Main, Command.PanUp, "pan up", K('K'));
        Bind(Scope.Main, Command.PanRight, "pan right", K('L'));
        Bind(Scope.Main, Command.NextPane, "next pane", S(SpecialKey.Tab));
        Bind(Scope.Main, Command.OpenLibrary, "open the plant library", K('o'));
        Bind(Scope.Main, Command.SaveOperatingPoint, "save the value into the plant file", K('s'));
        Bind(Scope.Main, Command.RevertToSavedValue, "back to the saved value", K('r'));
        Bind(Scope.Main, Command.ShowHelp, "help", K('?'));
        Bind(Scope.Main, Command.Quit, "quit", K('q'));
        Bind(Scope.Main, Command.Cancel, "clear the message (Esc never quits)", S(SpecialKey.Escape));

        Bind(Scope.PlanePane, Command.PanUp, "pan up", S(SpecialKey.Up));
        Bind(Scope.PlanePane, Command.PanDown, "pan down", S(SpecialKey.Down));
        Bind(Scope.PolesPane, Command.MoveUp, "select the previous pole", S(SpecialKey.Up), K('k'));
        Bind(Scope.PolesPane, Command.MoveDown, "select the next pole", S(SpecialKey.Down), K('j'));

        Bind(Scope.Help, Command.MoveUp, "scroll up", S(SpecialKey.Up), K('k'), S(SpecialKey.PageUp));
        Bind(Scope.Help, Command.MoveDown, "scroll down", S(SpecialKey.Down), K('j'), S(SpecialKey.PageDown));
        Bind(Scope.Help, Command.Cancel, "close the help", S(SpecialKey.Escape), K('?'), K('q'), S(SpecialKey.Enter));

        Bind(Scope.Library, Command.MoveUp, "previous file", S(SpecialKey.Up), K('k'));
        Bind(Scope.Library, Command.MoveDown, "next file", S(SpecialKey.Down), K('j'));
        Bind(Scope.Library, Command.Confirm, "open the file", S(SpecialKey.Enter), S(SpecialKey.Right), K('l'));
        Bind(Scope.Library, Command.Cancel, "close the library", S(SpecialKey.Escape), K('q'), K('o'));

        Bind(Scope.ValueEntry, Command.Confirm, "set the value", S(SpecialKey.Enter));
        Bind(Scope.ValueEntry, Command.DeleteBackward, "delete a character", S(SpecialKey.Backspace));
        Bind(Scope.ValueEntry, Command.Cancel, "cancel", S(SpecialKey.Escape));

        Bind(Scope.QuitConfirm, Command.SaveAndQuit, "save, then quit", K('s'), K('y'));
        Bind(Scope.QuitConfirm, Command.DiscardAndQuit, "quit without saving", K('d'), K('n'));
        Bind(Scope.QuitConfirm, Command.Cancel, "keep working", S(SpecialKey.Escape), K('c'));

        Bind(Scope.Everywhere, Command.QuitNow, "quit at once (an unsaved value goes to a recovery file)", KeyChord.CtrlOf('c'));
        return table.ToImmutable();
    }
}
