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
    public void Save_writes_the_value_with_its_verdict()
    {
        var (state, effects) = Update.Apply(Unsaved(), Command.SaveOperatingPoint);
        var save = Assert.IsType<SaveOperatingPointEffect>(Assert.Single(effects));
        Assert.False(save.QuitAfter);
        Assert.Equal("meets every spec at the nominal values", save.Verdict);
        Assert.Equal("saving K = 5.2", state.Message!.Text);
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
