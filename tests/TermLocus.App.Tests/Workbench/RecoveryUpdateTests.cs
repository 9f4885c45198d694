using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

/// <summary>A recovery file found on opening a plant: offered, applied as an unsaved value, discarded or kept.</summary>
public class RecoveryUpdateTests
{
    private const string RecoveryPath = FilePlants.Path + ".recovery";
    private static readonly DateTimeOffset PlantChanged = new(2026, 3, 4, 5, 0, 0, TimeSpan.Zero);

    private static RecoveryFile Fresh(double value = 6.4) =>
        new(RecoveryPath, PlantChanged.AddMinutes(20), PlantChanged, "K", value, null);

    private static WorkbenchState OpenedWith(RecoveryFile recovery)
    {
        var (start, _) = Update.Start(null, TestPlants.Folder);
        return Update.Receive(start, new PlantLoaded(FilePlants.SecondOrder()) { Recovery = recovery }).State;
    }

    [Fact]
    public void Opening_a_plant_with_a_recovery_file_offers_it_and_changes_nothing_yet()
    {
        var state = OpenedWith(Fresh());
        Assert.Equal(new RecoveryOverlay(Fresh()), state.Overlay);
        Assert.Equal(5.0, state.Session!.Sweep.Value);
        Assert.False(state.Unsaved);
        Assert.Equal("found second.toml.recovery (an unsaved value from last time)", state.Message!.Text);
        Assert.Equal(Command.ApplyRecovery, KeyMap.Lookup(state, KeyChord.Of('a')));
        Assert.Equal(Command.DiscardRecovery, KeyMap.Lookup(state, KeyChord.Of('d')));
        Assert.Equal(Command.Cancel, KeyMap.Lookup(state, KeyChord.Of('k')));
        Assert.Equal(Command.Cancel, KeyMap.Lookup(state, KeyChord.Of(SpecialKey.Escape)));
        Assert.Equal(Command.QuitNow, KeyMap.Lookup(state, KeyChord.CtrlOf('c')));
    }

    [Fact]
    public void Applying_sets_the_value_as_unsaved_and_writes_nothing_to_the_plant()
    {
        var (state, effects) = Update.Apply(OpenedWith(Fresh()), Command.ApplyRecovery);
        Assert.Equal(Overlay.None, state.Overlay);
        Assert.Equal(6.4, state.Session!.Sweep.Value);
        Assert.Equal(5.0, state.Session.Sweep.SavedValue);
        Assert.True(state.Unsaved);
        Assert.Equal(RecoveryPath, state.Session.AppliedRecovery);
        Assert.DoesNotContain(effects, e => e is SaveOperatingPointEffect or DeleteRecoveryEffect);
        Assert.Equal("K = 6.4 from the recovery file, not saved yet: s saves it, r goes back to 5", state.Message!.Text);
        // s² + 2s + 6.4 = 0: s = -1 ± j√5.4 (quadratic formula).
        Assert.Equal(Math.Sqrt(5.4), state.Session.Poles.Poles.Max(p => p.Imaginary), 1e-9);
    }

    [Fact]
    public void Saving_an_applied_value_into_its_plant_deletes_the_recovery_file()
    {
        var applied = Update.Apply(OpenedWith(Fresh()), Command.ApplyRecovery).State;
        var loaded = applied.Session!.Loaded;
        var (saved, effects) = Update.Receive(applied, new OperatingPointSaved(loaded.Plant, loaded.Document, 6.4, QuitAfter: false));
        Assert.Equal<Effect>([new DeleteRecoveryEffect(RecoveryPath)], effects);
        Assert.Equal("saved K = 6.4 to second.toml and deleted its recovery file", saved.Message!.Text);
        var done = Update.Receive(saved, new RecoveryDeleted(RecoveryPath, null)).State;
        Assert.Null(done.Session!.AppliedRecovery);
        Assert.Equal(saved.Message, done.Message); // the "saved" news stays
    }

    [Fact]
    public void Going_back_after_applying_keeps_the_recovery_file_and_says_so()
    {
        var applied = Update.Apply(OpenedWith(Fresh()), Command.ApplyRecovery).State;
        var (back, effects) = Update.Apply(applied, Command.RevertToSavedValue);
        Assert.DoesNotContain(effects, e => e is DeleteRecoveryEffect);
        Assert.Equal(5.0, back.Session!.Sweep.Value);
        Assert.Equal("back to the saved value K = 5; second.toml.recovery kept for next time", back.Message!.Text);
    }

    [Fact]
    public void Saving_an_applied_value_writes_an_ordinary_record_not_the_recovery_one()
    {
        var applied = Update.Apply(OpenedWith(Fresh()), Command.ApplyRecovery).State;
        var dialog = Update.Apply(applied, Command.SaveOperatingPoint).State;
        Assert.Equal(new SaveOverlay("K = 6.4", SaveOverlay.DefaultNote, NoteField: false), dialog.Overlay);
        var save = Assert.IsType<SaveOperatingPointEffect>(Assert.Single(Update.Apply(dialog, Command.Confirm).Effects));
        Assert.Equal("K = 6.4", save.Name);
        Assert.Equal(SaveOverlay.DefaultNote, save.Note);
    }

    [Fact]
    public void Saving_a_value_that_did_not_come_from_a_recovery_file_deletes_nothing()
    {
        var unsaved = FilePlants.Unsaved();
        var loaded = unsaved.Session!.Loaded;
        Assert.Empty(Update.Receive(unsaved, new OperatingPointSaved(loaded.Plant, loaded.Document, 5.2, QuitAfter: false)).Effects);
    }

    [Fact]
    public void Discarding_deletes_the_file_and_keeping_leaves_it()
    {
        var offered = OpenedWith(Fresh());
        var (discarding, effects) = Update.Apply(offered, Command.DiscardRecovery);
        Assert.Equal<Effect>([new DeleteRecoveryEffect(RecoveryPath)], effects);
        Assert.Equal(Overlay.None, discarding.Overlay);
        Assert.Equal("deleted second.toml.recovery", Update.Receive(discarding, new RecoveryDeleted(RecoveryPath, null)).State.Message!.Text);
        var failed = Update.Receive(discarding, new RecoveryDeleted(RecoveryPath, "Permission denied")).State;
        Assert.Equal(MessageKind.Error, failed.Message!.Kind);
        Assert.Equal("could not delete second.toml.recovery: Permission denied", failed.Message.Text);

        var (kept, keptEffects) = Update.Apply(offered, Command.Cancel);
        Assert.Empty(keptEffects);
        Assert.Equal(Overlay.None, kept.Overlay);
        Assert.False(kept.Unsaved);
        Assert.Equal("kept second.toml.recovery for later", kept.Message!.Text);
    }

    [Fact]
    public void A_broken_recovery_file_is_said_to_be_broken_and_cannot_be_applied()
    {
        var broken = new RecoveryFile(RecoveryPath, PlantChanged.AddMinutes(1), PlantChanged, null, null,
            "it is not a readable plant file: second.toml.recovery:2:6: error: invalid TOML");
        var offered = OpenedWith(broken);
        Assert.Equal("found second.toml.recovery; it cannot be applied", offered.Message!.Text);
        var (state, effects) = Update.Apply(offered, Command.ApplyRecovery);
        Assert.Empty(effects);
        Assert.IsType<RecoveryOverlay>(state.Overlay); // still there to discard or keep
        Assert.Equal(5.0, state.Session!.Sweep.Value);
        Assert.Equal(
            "second.toml.recovery cannot be applied: it is not a readable plant file: second.toml.recovery:2:6: error: invalid TOML",
            state.Message!.Text);
    }

    [Fact]
    public void An_older_recovery_file_is_offered_with_a_warning()
    {
        var stale = new RecoveryFile(RecoveryPath, PlantChanged.AddMinutes(-30), PlantChanged, "K", 6.4, null);
        Assert.True(stale.Stale);
        Assert.False(Fresh().Stale);
        Assert.Equal("found second.toml.recovery, older than the plant file", OpenedWith(stale).Message!.Text);
        Assert.Equal(6.4, Update.Apply(OpenedWith(stale), Command.ApplyRecovery).State.Session!.Sweep.Value);
    }

    [Fact]
    public void A_recovery_value_equal_to_the_files_has_nothing_to_apply()
    {
        var (state, effects) = Update.Apply(OpenedWith(Fresh(5)), Command.ApplyRecovery);
        Assert.Empty(effects);
        Assert.IsType<RecoveryOverlay>(state.Overlay);
        Assert.False(state.Unsaved);
        Assert.Equal("K = 5 is already the file's value: d deletes the recovery file, k keeps it", state.Message!.Text);
    }

    [Fact]
    public void A_plant_opened_from_the_library_is_offered_its_recovery_file_too()
    {
        var library = TestPlants.Opened() with { Overlay = new LibraryOverlay(0) };
        var state = Update.Receive(library, new PlantLoaded(FilePlants.SecondOrder()) { Recovery = Fresh() }).State;
        Assert.IsType<RecoveryOverlay>(state.Overlay);
    }
}
