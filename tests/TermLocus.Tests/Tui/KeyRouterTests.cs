using TermLocus.App.Workbench;
using TermLocus.Tui;
using Terminal.Gui.Input;

namespace TermLocus.Tests.Tui;

public class KeyRouterTests
{
    public static TheoryData<Key, KeyChord> Keys() => new()
    {
        { Key.CursorLeft, KeyChord.Of(SpecialKey.Left) },
        { Key.CursorRight, KeyChord.Of(SpecialKey.Right) },
        { Key.CursorUp, KeyChord.Of(SpecialKey.Up) },
        { Key.CursorDown, KeyChord.Of(SpecialKey.Down) },
        { Key.Home, KeyChord.Of(SpecialKey.Home) },
        { Key.End, KeyChord.Of(SpecialKey.End) },
        { Key.PageUp, KeyChord.Of(SpecialKey.PageUp) },
        { Key.PageDown, KeyChord.Of(SpecialKey.PageDown) },
        { Key.Tab, KeyChord.Of(SpecialKey.Tab) },
        { Key.Enter, KeyChord.Of(SpecialKey.Enter) },
        { Key.Esc, KeyChord.Of(SpecialKey.Escape) },
        { Key.Backspace, KeyChord.Of(SpecialKey.Backspace) },
        { Key.A, KeyChord.Of('a') },
        { Key.Z.WithShift, KeyChord.Of('Z') },
        { new Key('?'), KeyChord.Of('?') },
        { new Key('['), KeyChord.Of('[') },
        { new Key('='), KeyChord.Of('=') },
        { Key.C.WithCtrl, KeyChord.CtrlOf('c') },
    };

    [Theory]
    [MemberData(nameof(Keys))]
    public void Terminal_keys_become_workbench_keys(Key key, KeyChord expected) =>
        Assert.Equal(expected, KeyRouter.Translate(key));

    [Fact]
    public void Keys_the_workbench_has_no_use_for_translate_to_nothing()
    {
        Assert.Null(KeyRouter.Translate(Key.X.WithAlt));
        Assert.Null(KeyRouter.Translate(Key.Tab.WithShift));
        Assert.Null(KeyRouter.Translate(Key.F5));
        Assert.Null(KeyRouter.Translate(Key.CursorLeft.WithCtrl)); // modifiers with arrows are never needed, never used
    }

    [Fact]
    public void Every_key_of_the_key_table_can_be_typed()
    {
        // A binding whose key the translation can never produce would be dead; Ctrl+C is checked above.
        var typeable = Keys().Select(row => (KeyChord)row[1]).ToHashSet();
        foreach (var binding in KeyMap.Bindings.Where(b => b.Key.Special != SpecialKey.None))
        {
            Assert.Contains(binding.Key, typeable);
        }
    }
}
