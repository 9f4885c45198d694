using TermLocus.App.Workbench;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;

namespace TermLocus.Tui;

/// <summary>
/// The one place where the key table meets Terminal.Gui: every key press goes Terminal.Gui key → <see cref="KeyChord"/>
/// → <see cref="KeyMap"/> → command → <see cref="WorkbenchController"/>. Keys are taken before any view sees them,
/// so Terminal.Gui's own bindings (Esc quits, arrows move focus) never run; only suspend (Ctrl+Z) and refresh (F5)
/// pass through.
/// </summary>
internal sealed class KeyRouter
{
    private readonly IApplication app;
    private readonly WorkbenchController controller;
    private readonly object screen;

    private KeyRouter(IApplication app, WorkbenchController controller, object screen)
    {
        this.app = app;
        this.controller = controller;
        this.screen = screen;
    }

    /// <summary>Routes <paramref name="app"/>'s keys to <paramref name="controller"/> while <paramref name="screen"/> is on top.</summary>
    public static KeyRouter Install(IApplication app, WorkbenchController controller, object screen)
    {
        var router = new KeyRouter(app, controller, screen);
        app.Keyboard.KeyDown += router.OnKeyDown;
        return router;
    }

    /// <summary>Our key for a Terminal.Gui key, or null for keys the workbench has no use for.</summary>
    public static KeyChord? Translate(Key key)
    {
        var code = key.KeyCode & ~(KeyCode.ShiftMask | KeyCode.CtrlMask | KeyCode.AltMask);
        if (key.IsAlt)
        {
            return null;
        }

        if (key.IsCtrl)
        {
            return code is >= KeyCode.A and <= KeyCode.Z ? KeyChord.CtrlOf((char)('a' + (code - KeyCode.A))) : null;
        }

        SpecialKey special = code switch
        {
            KeyCode.CursorLeft => SpecialKey.Left,
            KeyCode.CursorRight => SpecialKey.Right,
            KeyCode.CursorUp => SpecialKey.Up,
            KeyCode.CursorDown => SpecialKey.Down,
            KeyCode.Home => SpecialKey.Home,
            KeyCode.End => SpecialKey.End,
            KeyCode.PageUp => SpecialKey.PageUp,
            KeyCode.PageDown => SpecialKey.PageDown,
            KeyCode.Tab when !key.IsShift => SpecialKey.Tab,
            KeyCode.Enter => SpecialKey.Enter,
            KeyCode.Esc => SpecialKey.Escape,
            KeyCode.Backspace => SpecialKey.Backspace,
            _ => SpecialKey.None,
        };
        if (special != SpecialKey.None)
        {
            return KeyChord.Of(special);
        }

        var rune = key.AsRune;
        return rune.Value is >= 0x20 and < 0xFFFF and not 0x7F && !char.IsControl((char)rune.Value)
            ? KeyChord.Of((char)rune.Value)
            : null;
    }

    private static bool PassesThrough(Key key)
    {
        var code = key.KeyCode & ~(KeyCode.ShiftMask | KeyCode.CtrlMask | KeyCode.AltMask);
        return (key.IsCtrl && code == KeyCode.Z) || code == KeyCode.F5;
    }

    private void OnKeyDown(object? sender, Key key)
    {
        // A dialog of Terminal.Gui's own (none today) would keep its keys.
        if (!ReferenceEquals(app.TopRunnableView, screen) || PassesThrough(key))
        {
            return;
        }

        key.Handled = true;
        if (Translate(key) is not { } chord)
        {
            return;
        }

        var state = controller.State;
        if (KeyMap.Lookup(state, chord) is { } command)
        {
            controller.Dispatch(command);
        }
        else if (KeyMap.TypesText(state) && chord.Special == SpecialKey.None && !chord.Ctrl)
        {
            controller.Receive(new CharacterTyped(chord.Character));
        }
    }
}
