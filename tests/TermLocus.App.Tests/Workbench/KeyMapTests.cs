using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class KeyMapTests
{
    [Fact]
    public void No_key_is_bound_twice_in_a_scope()
    {
        var duplicates = KeyMap.Bindings.GroupBy(b => (b.Scope, b.Key)).Where(g => g.Count() > 1).Select(g => g.Key).ToList();
        Assert.Empty(duplicates);
    }

    [Fact]
    public void Keys_bound_everywhere_are_not_reused_in_any_scope()
    {
        var everywhere = KeyMap.Bindings.Where(b => b.Scope == Scope.Everywhere).Select(b => b.Key).ToHashSet();
        Assert.DoesNotContain(KeyMap.Bindings, b => b.Scope != Scope.Everywhere && everywhere.Contains(b.Key));
    }

    [Fact]
    public void Pane_scopes_shadow_a_main_screen_key_only_to_move_in_the_pole_list()
    {
        // With the pole table focused (Tab), ↑/↓ and k/j select a pole instead of stepping the band; nothing else is shadowed.
        var main = KeyMap.Bindings.Where(b => b.Scope == Scope.Main).ToDictionary(b => b.Key, b => b.Command);
        var shadowing = KeyMap.Bindings
            .Where(b => b.Scope is Scope.PlanePane or Scope.PolesPane && main.ContainsKey(b.Key))
            .Select(b => (b.Scope, b.Command, Shadowed: main[b.Key]))
            .Distinct()
            .ToList();
        Assert.Equal(
            [(Scope.PolesPane, Command.MoveUp, Command.StepBandUp), (Scope.PolesPane, Command.MoveDown, Command.StepBandDown)],
            shadowing);
    }

    [Fact]
    public void Every_command_has_a_binding_and_a_description()
    {
        foreach (var command in Enum.GetValues<Command>())
        {
            var bindings = KeyMap.Bindings.Where(b => b.Command == command).ToList();
            Assert.True(bindings.Count > 0, $"{command} has no key");
            Assert.All(bindings, b => Assert.False(string.IsNullOrWhiteSpace(b.Description), $"{command} has no description"));
        }
    }

    [Fact]
    public void A_command_reads_the_same_for_every_key_in_a_scope()
    {
        var mixed = KeyMap.Bindings.GroupBy(b => (b.Scope, b.Command)).Where(g => g.Select(b => b.Description).Distinct().Count() > 1);
        Assert.Empty(mixed);
    }

    [Fact]
    public void Every_command_is_handled_by_update_in_every_kind_of_state()
    {
        // Update.Apply switches without a default arm; this proves no command throws at run time either.
        var states = new[]
        {
            WorkbenchState.Initial(null),
            TestPlants.Opened(),
            TestPlants.Traced() with { Overlay = new HelpOverlay(0) },
            TestPlants.Opened() with { Overlay = new ValueEntryOverlay("1", null) },
            TestPlants.Opened() with { Overlay = new LibraryOverlay(0) },
            TestPlants.Opened() with { Overlay = new QuitConfirmOverlay() },
            FilePlants.Unsaved() with { Overlay = new SaveConflictOverlay(FileOnDisk.Changed, "n", "n", false, "/plants/second.2.toml") },
            FilePlants.Unsaved() with { Overlay = new SaveConflictOverlay(FileOnDisk.Missing, "n", "n", true, "/plants/second.2.toml") },
            FilePlants.Unsaved() with { Overlay = new SaveAsOverlay("/plants/x.toml", "n", "n", false, null) },
            FilePlants.Unsaved() with { Overlay = new RecoveryOverlay(new RecoveryFile("/plants/second.toml.recovery", default, default, "K", 6, null)) },
            WorkbenchState.Initial(null) with { Overlay = new SaveAsOverlay(string.Empty, "n", "n", false, null) },
        };
        foreach (var state in states)
        {
            foreach (var command in Enum.GetValues<Command>())
            {
                var (next, effects) = Update.Apply(state, command);
                Assert.NotNull(next);
                Assert.False(effects.IsDefault);
            }
        }
    }

    [Fact]
    public void No_binding_needs_a_modifier_with_an_arrow_and_only_ctrl_c_uses_ctrl()
    {
        Assert.All(KeyMap.Bindings.Where(b => b.Key.Ctrl), b => Assert.Equal(KeyChord.CtrlOf('c'), b.Key));
        Assert.All(KeyMap.Bindings.Where(b => b.Key.Ctrl), b => Assert.Equal(SpecialKey.None, b.Key.Special));
    }

    [Fact]
    public void Escape_never_quits()
    {
        var esc = KeyChord.Of(SpecialKey.Escape);
        Assert.DoesNotContain(KeyMap.Bindings, b => b.Key == esc && b.Command is Command.Quit or Command.QuitNow or Command.DiscardAndQuit or Command.SaveAndQuit);
    }

    [Theory]
    [InlineData('l', Command.StepSweepUp)]
    [InlineData('h', Command.StepSweepDown)]
    [InlineData('[', Command.FinerStep)]
    [InlineData('-', Command.FinerStep)]
    [InlineData(']', Command.CoarserStep)]
    [InlineData('+', Command.CoarserStep)]
    [InlineData('=', Command.EnterValue)]
    [InlineData('n', Command.JumpToNextBoundary)]
    [InlineData('p', Command.JumpToPreviousBoundary)]
    [InlineData('z', Command.ZoomIn)]
    [InlineData('Z', Command.ZoomOut)]
    [InlineData('f', Command.FitView)]
    [InlineData('o', Command.OpenLibrary)]
    [InlineData('?', Command.ShowHelp)]
    [InlineData('q', Command.Quit)]
    public void Main_screen_letters_mean_what_the_brief_says(char key, Command expected) =>
        Assert.Equal(expected, KeyMap.Lookup(TestPlants.Opened(), KeyChord.Of(key)));

    [Theory]
    [InlineData(SpecialKey.Left, Command.StepSweepDown)]
    [InlineData(SpecialKey.Right, Command.StepSweepUp)]
    [InlineData(SpecialKey.Home, Command.JumpToRangeStart)]
    [InlineData(SpecialKey.End, Command.JumpToRangeEnd)]
    [InlineData(SpecialKey.Enter, Command.EnterValue)]
    [InlineData(SpecialKey.PageDown, Command.JumpToNextBoundary)]
    [InlineData(SpecialKey.PageUp, Command.JumpToPreviousBoundary)]
    [InlineData(SpecialKey.Tab, Command.NextPane)]
    [InlineData(SpecialKey.Escape, Command.Cancel)]
    public void Main_screen_special_keys(SpecialKey key, Command expected) =>
        Assert.Equal(expected, KeyMap.Lookup(TestPlants.Opened(), KeyChord.Of(key)));

    [Fact]
    public void Arrows_up_and_down_follow_the_focused_pane()
    {
        var plane = TestPlants.Opened();
        var poles = plane with { Focus = Pane.Poles };
        Assert.Equal(Command.StepBandUp, KeyMap.Lookup(plane, KeyChord.Of(SpecialKey.Up)));
        Assert.Equal(Command.StepBandDown, KeyMap.Lookup(plane, KeyChord.Of('j')));
        Assert.Equal(Command.MoveUp, KeyMap.Lookup(poles, KeyChord.Of(SpecialKey.Up)));
        Assert.Equal(Command.StepSweepUp, KeyMap.Lookup(poles, KeyChord.Of(SpecialKey.Right)));
    }

    [Fact]
    public void An_overlay_takes_the_keys_but_ctrl_c_still_works()
    {
        var entry = TestPlants.Opened() with { Overlay = new ValueEntryOverlay(string.Empty, null) };
        Assert.Null(KeyMap.Lookup(entry, KeyChord.Of('q')));
        Assert.Equal(Command.Confirm, KeyMap.Lookup(entry, KeyChord.Of(SpecialKey.Enter)));
        Assert.Equal(Command.QuitNow, KeyMap.Lookup(entry, KeyChord.CtrlOf('c')));
        var help = TestPlants.Opened() with { Overlay = new HelpOverlay(0) };
        Assert.Equal(Command.Cancel, KeyMap.Lookup(help, KeyChord.Of('q')));
    }

    [Fact]
    public void Key_names_for_help_are_plain()
    {
        var g = App.Text.Glyphs.Ascii;
        Assert.Equal("Left", KeyChord.Of(SpecialKey.Left).Name(g));
        Assert.Equal("PgDn", KeyChord.Of(SpecialKey.PageDown).Name(g));
        Assert.Equal("Ctrl+C", KeyChord.CtrlOf('c').Name(g));
        Assert.Equal("Space", KeyChord.Of(' ').Name(g));
        Assert.Equal("→", KeyChord.Of(SpecialKey.Right).Name(App.Text.Glyphs.Unicode));
    }
}
