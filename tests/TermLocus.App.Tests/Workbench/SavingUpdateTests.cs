using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class SavingUpdateTests
{
    private static WorkbenchState Unsaved() => TestPlants.Run(TestPlants.Opened(), Command.StepSweepUp).State;

    [Fact]
    public void Quit_with_nothing_unsaved_quits()
    {
        var (_, effects) = Update.Apply(TestPlants.Opened(), Command.Quit);
        Assert.Equal<Effect>([new QuitEffect()], effects);
    }

    [Fact]
    public void Quit_with_an_unsaved_value_asks_first()
    {
        var (state, effects) = Update.Apply(Unsaved(), Command.Quit);
        Assert.Empty(effects);
        Assert.IsType<QuitConfirmOverlay>(state.Overlay);
        Assert.Equal(Overlay.None, Update.Apply(state, Command.Cancel).State.Overlay);
        Assert.Equal<Effect>([new QuitEffect()], Update.Apply(state, Command.DiscardAndQuit).Effects);
    }

    [Fact]
    public void Save_and_quit_saves_then_quits_when_the_save_arrives()
    {
        var asked = Update.Apply(Unsaved(), Command.Quit).State;
        var (state, effects) = Update.Apply(asked, Command.SaveAndQuit);
        var save = Assert.IsType<SaveOperatingPointEffect>(Assert.Single(effects));
        Assert.True(save.QuitAfter);
        Assert.Equal(5.2, save.Value);
        var (_, after) = Update.Receive(state, new OperatingPointSaved(save.Loaded.Plant, null, save.Value, QuitAfter: true));
        Assert.Equal<Effect>([new QuitEffect()], after);
    }

    [Fact]
    public void S_asks_for_a_name_and_a_note_with_defaults_before_writing()
    {
        var (dialog, effects) = Update.Apply(Unsaved(), Command.SaveOperatingPoint);
        Assert.Empty(effects);
        Assert.Equal(new SaveOverlay("K = 5.2", "saved from the workbench", NoteField: false), dialog.Overlay);
        var (state, saving) = Update.Apply(dialog, Command.Confirm);
        var save = Assert.IsType<SaveOperatingPointEffect>(Assert.Single(saving));
        Assert.False(save.QuitAfter);
        Assert.Equal("K = 5.2", save.Name);
        Assert.Equal("saved from the workbench", save.Note);
        Assert.Equal("meets every spec at the nominal values", save.Verdict); // no loop model: the poles' own verdict
        Assert.Equal(Overlay.None, state.Overlay);
        Assert.Equal("saving K = 5.2", state.Message!.Text);
    }

    [Fact]
    public void Typing_replaces_the_defaults_and_tab_moves_to_the_note()
    {
        var dialog = Update.Apply(Unsaved(), Command.SaveOperatingPoint).State;
        for (int i = 0; i < "K = 5.2".Length; i++)
        {
            dialog = Update.Apply(dialog, Command.DeleteBackward).State;
        }

        dialog = Type(dialog, "bench 3");
        dialog = Update.Apply(dialog, Command.NextPane).State;
        Assert.True(((SaveOverlay)dialog.Overlay).NoteField);
        dialog = Type(dialog, "; oil at 40 C");
        var save = Assert.IsType<SaveOperatingPointEffect>(Assert.Single(Update.Apply(dialog, Command.Confirm).Effects));
        Assert.Equal("bench 3", save.Name);
        Assert.Equal("saved from the workbench; oil at 40 C", save.Note);
    }

    [Fact]
    public void Escape_closes_the_dialog_and_writes_nothing()
    {
        var dialog = Update.Apply(Unsaved(), Command.SaveOperatingPoint).State;
        var (state, effects) = Update.Apply(dialog, Command.Cancel);
        Assert.Empty(effects);
        Assert.Equal(Overlay.None, state.Overlay);
        Assert.True(state.Unsaved);
    }

    [Fact]
    public void Keys_of_the_main_screen_are_text_in_the_dialog()
    {
        var dialog = Update.Apply(Unsaved(), Command.SaveOperatingPoint).State;
        Assert.Null(KeyMap.Lookup(dialog, KeyChord.Of('q')));
        Assert.Null(KeyMap.Lookup(dialog, KeyChord.Of('s')));
        Assert.Equal(Command.NextPane, KeyMap.Lookup(dialog, KeyChord.Of(SpecialKey.Tab)));
        Assert.Equal("K = 5.2q", ((SaveOverlay)Type(dialog, "q").Overlay).Name);
    }

    [Fact]
    public void The_saved_verdict_is_the_band_wide_one_in_ascii()
    {
        // K/(s(s+a)) at K = 5.2 misses ζ ≥ 0.4 at a = 1.6 (ζ = 0.8/√5.2 = 0.3508 at -0.8 ± j√4.56); check's own wording, no prefix.
        var state = BandPlants.Apply(BandPlants.Opened(BandPlants.Quadratic()), Command.StepSweepUp);
        var dialog = Update.Apply(state, Command.SaveOperatingPoint).State;
        var save = Assert.IsType<SaveOperatingPointEffect>(Assert.Single(Update.Apply(dialog, Command.Confirm).Effects));
        Assert.StartsWith("FAIL ! min_damping: zeta 0.3508 < 0.4 at -0.8000 +/- j2.135 (with a -20 %", save.Verdict, StringComparison.Ordinal);
    }

    [Fact]
    public void A_save_asked_before_the_band_check_is_back_leaves_the_verdict_to_the_save()
    {
        var (state, _) = Update.Apply(BandPlants.Opened(BandPlants.Quadratic()), Command.StepSweepUp);
        var dialog = Update.Apply(state, Command.SaveOperatingPoint).State;
        var save = Assert.IsType<SaveOperatingPointEffect>(Assert.Single(Update.Apply(dialog, Command.Confirm).Effects));
        Assert.Null(save.Verdict);
    }

    private static WorkbenchState Type(WorkbenchState state, string text)
    {
        foreach (char c in text)
        {
            state = Update.Receive(state, new CharacterTyped(c)).State;
        }

        return state;
    }

    [Fact]
    public void Save_skips_the_write_when_nothing_changed()
    {
        var (state, effects) = Update.Apply(TestPlants.Opened(), Command.SaveOperatingPoint);
        Assert.Empty(effects);
        Assert.Equal("nothing to save: K = 5 is the value in the file", state.Message!.Text);
    }

    [Fact]
    public void A_saved_value_is_no_longer_unsaved()
    {
        var unsaved = Unsaved();
        var saved = Update.Receive(unsaved, new OperatingPointSaved(unsaved.Session!.Loaded.Plant, null, 5.2, QuitAfter: false)).State;
        Assert.False(saved.Unsaved);
        Assert.Equal(5.2, saved.Session!.Sweep.SavedValue);
        Assert.Equal("saved K = 5.2 to second.toml", saved.Message!.Text);
        Assert.Equal<Effect>([new QuitEffect()], Update.Apply(saved, Command.Quit).Effects);
    }

    [Fact]
    public void A_failed_save_keeps_the_value_unsaved_and_says_why()
    {
        var state = Update.Receive(Unsaved(), new OperatingPointSaveFailed("second.toml changed on disk since it was read")).State;
        Assert.True(state.Unsaved);
        Assert.Equal(MessageKind.Error, state.Message!.Kind);
        Assert.Equal("not saved: second.toml changed on disk since it was read", state.Message.Text);
    }

    [Fact]
    public void Ctrl_c_with_an_unsaved_value_writes_the_recovery_file_and_quits()
    {
        var unsaved = Unsaved();
        var (_, effects) = Update.Apply(unsaved, Command.QuitNow);
        Assert.Equal(2, effects.Length);
        var recovery = Assert.IsType<SaveRecoveryEffect>(effects[0]);
        Assert.Equal(5.2, recovery.Value);
        Assert.IsType<QuitEffect>(effects[1]);
        Assert.Equal("/plants/second.toml.recovery", SaveRecoveryEffect.RecoveryPathFor(recovery.Loaded.Plant.Path));
    }

    [Fact]
    public void Ctrl_c_with_nothing_unsaved_just_quits()
    {
        Assert.Equal<Effect>([new QuitEffect()], Update.Apply(TestPlants.Opened(), Command.QuitNow).Effects);
    }
}
