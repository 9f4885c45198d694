using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

/// <summary>Saving when the plant file changed on disk or is gone: noticed, said, and a choice; never a silent overwrite.</summary>
public class FileConflictUpdateTests
{
    private const string Suggested = TestPlants.Folder + "/second.2.toml";

    [Fact]
    public void Opening_the_save_dialog_looks_at_the_file_on_disk_again()
    {
        var unsaved = FilePlants.Unsaved();
        var (state, effects) = Update.Apply(unsaved, Command.SaveOperatingPoint);
        Assert.IsType<SaveOverlay>(state.Overlay);
        var check = Assert.IsType<CheckPlantFileEffect>(Assert.Single(effects));
        Assert.Equal(FilePlants.Path, check.Path);
        Assert.True(check.ExpectedSha256.SequenceEqual(FilePlants.Sha(unsaved)));
    }

    [Fact]
    public void A_touch_of_the_open_file_asks_for_a_check_and_one_of_another_file_does_not()
    {
        var unsaved = FilePlants.Unsaved();
        Assert.IsType<CheckPlantFileEffect>(Assert.Single(Update.Receive(unsaved, new PlantFileTouched(FilePlants.Path)).Effects));
        Assert.Empty(Update.Receive(unsaved, new PlantFileTouched(TestPlants.Folder + "/other.toml")).Effects);
    }

    [Fact]
    public void A_check_finding_the_file_changed_says_so_once_and_the_session_remembers()
    {
        var changed = FilePlants.Checked(FilePlants.Unsaved(), FileOnDisk.Changed);
        Assert.Equal(FileOnDisk.Changed, changed.Session!.Disk);
        Assert.Equal(MessageKind.Warning, changed.Message!.Kind);
        Assert.Equal("second.toml changed on disk; s lets you choose what to do", changed.Message.Text);

        var check = new PlantFileChecked(FilePlants.Path, FilePlants.Sha(changed), FileOnDisk.Changed, Suggested);
        var (quiet, effects) = Update.Receive(changed with { Message = null }, check);
        Assert.Null(quiet.Message); // the same news is not repeated on every touch
        Assert.Empty(effects);
        var news = new PlantFileChecked(FilePlants.Path, FilePlants.Sha(changed), FileOnDisk.Missing, Suggested);
        Assert.Equal<Effect>([new ScanLibraryEffect(TestPlants.Folder)], Update.Receive(quiet, news).Effects); // the library pane follows
        var gone = FilePlants.Checked(quiet, FileOnDisk.Missing);
        Assert.Equal("second.toml is gone from disk; s lets you choose what to do", gone.Message!.Text);
        var back = FilePlants.Checked(gone, FileOnDisk.AsLoaded);
        Assert.Equal(FileOnDisk.AsLoaded, back.Session!.Disk);
        Assert.Equal("second.toml on disk is again as it was loaded", back.Message!.Text);
    }

    [Fact]
    public void A_check_made_against_bytes_since_replaced_by_our_own_save_is_ignored()
    {
        var unsaved = FilePlants.Unsaved();
        var stale = new PlantFileChecked(FilePlants.Path, [1, 2, 3], FileOnDisk.Changed, Suggested);
        Assert.Equal(unsaved, Update.Receive(unsaved, stale).State);
    }

    [Fact]
    public void Checks_are_ignored_while_our_own_save_runs_and_heeded_again_once_it_is_back()
    {
        var dialog = Update.Apply(FilePlants.Unsaved(), Command.SaveOperatingPoint).State;
        var saving = Update.Apply(dialog, Command.Confirm).State;
        Assert.True(saving.Session!.SaveInFlight);
        Assert.Equal(FileOnDisk.AsLoaded, FilePlants.Checked(saving, FileOnDisk.Changed).Session!.Disk); // our own rename
        var failed = Update.Receive(saving, new OperatingPointSaveFailed("disk full")).State;
        Assert.False(failed.Session!.SaveInFlight);
        Assert.Equal("not saved: disk full", failed.Message!.Text);
        Assert.Equal(FileOnDisk.Changed, FilePlants.Checked(failed, FileOnDisk.Changed).Session!.Disk);
    }

    [Fact]
    public void S_on_a_changed_file_offers_reading_it_again_saving_under_another_name_or_cancelling()
    {
        var changed = FilePlants.Checked(FilePlants.Unsaved(), FileOnDisk.Changed);
        var (state, effects) = Update.Apply(changed, Command.SaveOperatingPoint);
        Assert.Equal(new SaveConflictOverlay(FileOnDisk.Changed, "K = 5.2", SaveOverlay.DefaultNote, false, Suggested), state.Overlay);
        Assert.IsType<CheckPlantFileEffect>(Assert.Single(effects)); // nothing is written
        Assert.Equal(Command.ReloadFromDisk, KeyMap.Lookup(state, KeyChord.Of('r')));
        Assert.Equal(Command.SaveUnderAnotherName, KeyMap.Lookup(state, KeyChord.Of('a')));
        Assert.Equal(Command.Cancel, KeyMap.Lookup(state, KeyChord.Of(SpecialKey.Escape)));
        Assert.Null(KeyMap.Lookup(state, KeyChord.Of('s')));
    }

    [Fact]
    public void A_check_finding_the_file_changed_while_the_dialog_is_open_turns_it_into_the_choice()
    {
        var dialog = Update.Apply(FilePlants.Unsaved(), Command.SaveOperatingPoint).State;
        dialog = FilePlants.Type(dialog, " bench");
        var state = FilePlants.Checked(dialog, FileOnDisk.Changed); // the check asked for by s comes back
        Assert.Equal(new SaveConflictOverlay(FileOnDisk.Changed, "K = 5.2 bench", SaveOverlay.DefaultNote, false, Suggested), state.Overlay);
        Assert.IsType<SaveOverlay>(FilePlants.Checked(dialog, FileOnDisk.AsLoaded).Overlay); // as loaded: the dialog stays
    }

    [Fact]
    public void Enter_in_the_dialog_when_the_file_is_known_changed_offers_the_choice_and_writes_nothing()
    {
        var dialog = Update.Apply(FilePlants.Unsaved(), Command.SaveOperatingPoint).State;
        dialog = dialog with { Session = dialog.Session! with { Disk = FileOnDisk.Changed } };
        var (state, effects) = Update.Apply(dialog, Command.Confirm);
        Assert.Equal("K = 5.2", Assert.IsType<SaveConflictOverlay>(state.Overlay).Name);
        Assert.DoesNotContain(effects, e => e is SaveOperatingPointEffect);
    }

    [Fact]
    public void A_save_the_worker_refused_opens_the_choice()
    {
        var unsaved = FilePlants.Unsaved();
        var request = new SaveOperatingPointEffect(unsaved.Session!.Loaded, 5.2, null, false, "K = 5.2", "n");
        var refused = new SaveRefused(request, SaveRefusal.FileChanged, "/plants/second.toml changed on disk since it was loaded", Suggested);
        var state = Update.Receive(unsaved, refused).State;
        Assert.Equal(new SaveConflictOverlay(FileOnDisk.Changed, "K = 5.2", "n", false, Suggested), state.Overlay);
        Assert.Equal(FileOnDisk.Changed, state.Session!.Disk);
        Assert.Equal("not saved: second.toml changed on disk", state.Message!.Text);
        Assert.True(state.Unsaved);
    }

    [Fact]
    public void Reading_the_file_again_keeps_the_swept_value_unsaved()
    {
        var conflict = FilePlants.Run(FilePlants.Checked(FilePlants.Unsaved(), FileOnDisk.Changed), Command.SaveOperatingPoint).State;
        var (asked, effects) = Update.Apply(conflict, Command.ReloadFromDisk);
        Assert.Equal(Overlay.None, asked.Overlay);
        Assert.Equal<Effect>([new LoadPlantEffect(FilePlants.Path, new KeptValue("K", 5.2))], effects);
        Assert.Equal("reading second.toml again, keeping K = 5.2", asked.Message!.Text);

        var reread = FilePlants.SecondOrder("# edited by someone else\n");
        var state = Update.Receive(asked, new PlantLoaded(reread) { Kept = new KeptValue("K", 5.2) }).State;
        var session = state.Session!;
        Assert.Equal(5.2, session.Sweep.Value);
        Assert.Equal(5.0, session.Sweep.SavedValue);
        Assert.Equal(FileOnDisk.AsLoaded, session.Disk);
        Assert.Same(reread.Document, session.Loaded.Document);
        Assert.Equal("read second.toml again; kept K = 5.2, not saved yet (the file has 5)", state.Message!.Text);
        // s² + 2s + 5.2 = 0: s = -1 ± j√4.2 (quadratic formula).
        var upper = session.Poles.Poles.Single(p => p.Imaginary > 0);
        Assert.Equal(-1.0, upper.Real, 1e-9);
        Assert.Equal(Math.Sqrt(4.2), upper.Imaginary, 1e-9);
    }

    [Fact]
    public void A_file_read_again_that_no_longer_sweeps_the_parameter_says_the_value_was_not_kept()
    {
        var state = Update.Receive(FilePlants.Unsaved(), new PlantLoaded(FilePlants.SecondOrder()) { Kept = new KeptValue("Kc", 3) }).State;
        Assert.Equal(5.0, state.Session!.Sweep.Value);
        Assert.Equal("read second.toml again; it now sweeps K, not Kc, so Kc = 3 was not kept", state.Message!.Text);
    }

    [Fact]
    public void A_file_read_again_that_is_now_broken_leaves_the_session_and_gives_the_located_error()
    {
        var unsaved = FilePlants.Unsaved();
        var state = Update.Receive(unsaved, new PlantLoadFailed(FilePlants.Path, FilePlants.Path + ":3:7: error: expected '='")).State;
        Assert.Same(unsaved.Session, state.Session);
        Assert.Equal(MessageKind.Error, state.Message!.Kind);
        Assert.Equal("second.toml:3:7: error: expected '=' (not read again: the version loaded before stays open)", state.Message.Text);
    }

    [Fact]
    public void A_gone_file_cannot_be_read_again_and_a_changed_one_is_never_written_over()
    {
        var gone = FilePlants.Run(FilePlants.Checked(FilePlants.Unsaved(), FileOnDisk.Missing), Command.SaveOperatingPoint).State;
        var (reload, reloadEffects) = Update.Apply(gone, Command.ReloadFromDisk);
        Assert.Empty(reloadEffects);
        Assert.IsType<SaveConflictOverlay>(reload.Overlay);
        Assert.Equal("second.toml is gone, there is nothing to read: a saves under another name", reload.Message!.Text);

        var changed = FilePlants.Run(FilePlants.Checked(FilePlants.Unsaved(), FileOnDisk.Changed), Command.SaveOperatingPoint).State;
        var (write, writeEffects) = Update.Apply(changed, Command.WriteFileAgain);
        Assert.Empty(writeEffects);
        Assert.IsType<SaveConflictOverlay>(write.Overlay);
        Assert.StartsWith("second.toml is there, changed by another program; it is never overwritten", write.Message!.Text, StringComparison.Ordinal);
    }

    [Fact]
    public void A_gone_file_can_be_written_again_where_it_was_when_asked()
    {
        var gone = FilePlants.Run(FilePlants.Checked(FilePlants.Unsaved(), FileOnDisk.Missing), Command.SaveOperatingPoint).State;
        var (state, effects) = Update.Apply(gone, Command.WriteFileAgain);
        var save = Assert.IsType<SaveOperatingPointEffect>(Assert.Single(effects));
        Assert.Equal(SaveMode.WriteAgain, save.Mode);
        Assert.Null(save.TargetPath);
        Assert.Equal(5.2, save.Value);
        Assert.Equal(Overlay.None, state.Overlay);
    }

    [Fact]
    public void S_offers_the_choice_for_a_gone_file_even_with_nothing_unsaved()
    {
        var (start, _) = Update.Start(null, TestPlants.Folder);
        var opened = Update.Receive(start, new PlantLoaded(FilePlants.SecondOrder())).State;
        var state = Update.Apply(FilePlants.Checked(opened, FileOnDisk.Missing), Command.SaveOperatingPoint).State;
        Assert.Equal(new SaveConflictOverlay(FileOnDisk.Missing, "K = 5", SaveOverlay.DefaultNote, false, Suggested), state.Overlay);
    }

    [Fact]
    public void Save_under_another_name_offers_the_suggested_file_and_writes_a_new_one()
    {
        var conflict = FilePlants.Run(FilePlants.Checked(FilePlants.Unsaved(), FileOnDisk.Changed), Command.SaveOperatingPoint).State;
        var box = Update.Apply(conflict, Command.SaveUnderAnotherName).State;
        Assert.Equal(new SaveAsOverlay(Suggested, "K = 5.2", SaveOverlay.DefaultNote, false, null), box.Overlay);
        Assert.True(KeyMap.TypesText(box));
        Assert.Null(KeyMap.Lookup(box, KeyChord.Of('q'))); // letters are text here
        var (state, effects) = Update.Apply(box, Command.Confirm);
        var save = Assert.IsType<SaveOperatingPointEffect>(Assert.Single(effects));
        Assert.Equal(SaveMode.NewFile, save.Mode);
        Assert.Equal(Suggested, save.TargetPath);
        Assert.Equal("K = 5.2", save.Name);
        Assert.Equal("saving K = 5.2 to second.2.toml", state.Message!.Text);
    }

    [Fact]
    public void The_file_name_box_takes_typing_and_refuses_names_that_are_not_plant_files()
    {
        var box = FilePlants.Run(FilePlants.Checked(FilePlants.Unsaved(), FileOnDisk.Changed), Command.SaveOperatingPoint, Command.SaveUnderAnotherName).State;
        for (int i = 0; i < "toml".Length; i++)
        {
            box = Update.Apply(box, Command.DeleteBackward).State;
        }

        box = FilePlants.Type(box, "txt");
        Assert.Equal(TestPlants.Folder + "/second.2.txt", ((SaveAsOverlay)box.Overlay).Path);
        var (refused, effects) = Update.Apply(box, Command.Confirm);
        Assert.Empty(effects);
        Assert.Equal("a plant file name ends in .toml (the library lists only those)", ((SaveAsOverlay)refused.Overlay).Problem);

        var empty = refused;
        while (((SaveAsOverlay)empty.Overlay).Path.Length > 0)
        {
            empty = Update.Apply(empty, Command.DeleteBackward).State;
        }

        Assert.Null(((SaveAsOverlay)empty.Overlay).Problem); // typing clears the old problem
        Assert.Equal("type a file name, e.g. second.2.toml", ((SaveAsOverlay)Update.Apply(empty, Command.Confirm).State.Overlay).Problem);
    }

    [Fact]
    public void A_name_that_is_taken_brings_the_box_back_with_the_problem()
    {
        var unsaved = FilePlants.Unsaved();
        var request = new SaveOperatingPointEffect(unsaved.Session!.Loaded, 5.2, null, false, "K = 5.2", "n") { Mode = SaveMode.NewFile, TargetPath = Suggested };
        var state = Update.Receive(unsaved, new SaveRefused(request, SaveRefusal.TargetExists, Suggested + " exists already; choose another name", TestPlants.Folder + "/second.3.toml")).State;
        Assert.Equal(new SaveAsOverlay(Suggested, "K = 5.2", "n", false, "second.2.toml exists already; type another name"), state.Overlay);
    }

    [Fact]
    public void Saved_under_another_name_the_new_file_is_the_open_one_and_the_library_is_read_again()
    {
        var unsaved = FilePlants.Checked(FilePlants.Unsaved(), FileOnDisk.Changed);
        var written = FilePlants.SecondOrder("# as saved\n", Suggested);
        var (state, effects) = Update.Receive(unsaved, new OperatingPointSaved(written.Plant, written.Document, 5.2, QuitAfter: false));
        var session = state.Session!;
        Assert.Equal(Suggested, session.Loaded.Plant.Path);
        Assert.False(session.Unsaved);
        Assert.Equal(FileOnDisk.AsLoaded, session.Disk);
        Assert.Equal("saved K = 5.2 to second.2.toml, now the open file", state.Message!.Text);
        Assert.Contains(effects, e => e is ScanLibraryEffect { Folder: TestPlants.Folder });
        Assert.DoesNotContain(effects, e => e is QuitEffect);
    }

    [Fact]
    public void Saved_under_another_name_the_locus_shown_stays_current_without_tracing_again()
    {
        var unsaved = FilePlants.Unsaved();
        var key = unsaved.Session!.Loop.Key;
        var traced = Update.Receive(unsaved, new LocusTraced(new LocusAnalysis(key, [TestPlants.RealBranch(0, 1, 0, -1)], []))).State;
        Assert.True(traced.Session!.LocusIsCurrent);
        var written = FilePlants.SecondOrder("# as saved\n", Suggested);
        var (state, effects) = Update.Receive(traced, new OperatingPointSaved(written.Plant, written.Document, 5.2, QuitAfter: false));
        Assert.True(state.Session!.LocusIsCurrent); // the trace key names the file; the same loop's locus is kept
        Assert.Equal(Suggested, state.Session.Loop.Key.PlantPath);
        Assert.DoesNotContain(effects, e => e is TraceLocusEffect);
    }

    [Fact]
    public void Cancel_writes_nothing_and_says_so()
    {
        var conflict = FilePlants.Run(FilePlants.Checked(FilePlants.Unsaved(), FileOnDisk.Changed), Command.SaveOperatingPoint).State;
        foreach (var open in new[] { conflict, Update.Apply(conflict, Command.SaveUnderAnotherName).State })
        {
            var (state, effects) = Update.Apply(open, Command.Cancel);
            Assert.Empty(effects);
            Assert.Equal(Overlay.None, state.Overlay);
            Assert.True(state.Unsaved);
            Assert.Equal("not saved: nothing was written", state.Message!.Text);
        }
    }

    [Fact]
    public void The_quit_question_carries_through_the_choice_and_quits_once_saved_elsewhere()
    {
        var changed = FilePlants.Checked(FilePlants.Unsaved(), FileOnDisk.Changed);
        var conflict = FilePlants.Run(changed, Command.Quit, Command.SaveAndQuit).State;
        Assert.True(Assert.IsType<SaveConflictOverlay>(conflict.Overlay).QuitAfter);
        var (saving, effects) = FilePlants.Run(conflict, Command.SaveUnderAnotherName, Command.Confirm);
        var save = Assert.IsType<SaveOperatingPointEffect>(Assert.Single(effects));
        Assert.True(save.QuitAfter);
        var written = FilePlants.SecondOrder("# as saved\n", Suggested);
        var (_, after) = Update.Receive(saving, new OperatingPointSaved(written.Plant, written.Document, 5.2, QuitAfter: true));
        Assert.Contains(after, e => e is QuitEffect);
    }
}
