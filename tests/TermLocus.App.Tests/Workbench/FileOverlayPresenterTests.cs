using TermLocus.App.Text;
using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

/// <summary>The words and keys of the boxes about files, and the file's state in the panel and the save dialog.</summary>
public class FileOverlayPresenterTests
{
    private const int Width = 72;

    private static List<string> Trimmed(IEnumerable<string> lines) => lines.Select(l => l.TrimEnd()).ToList();

    private static WorkbenchState Conflict(FileOnDisk disk) =>
        FilePlants.Run(FilePlants.Checked(FilePlants.Unsaved(), disk), Command.SaveOperatingPoint).State;

    [Fact]
    public void A_changed_file_offers_reading_it_again_and_another_name_but_not_writing_over_it()
    {
        var state = Conflict(FileOnDisk.Changed);
        var lines = Trimmed(FileOverlayPresenter.SaveConflict(state, (SaveConflictOverlay)state.Overlay, Width, Glyphs.Unicode));
        Assert.Equal(
            [
                "second.toml changed on disk since it was loaded: another program wrote",
                "or replaced it. Nothing was written.",
                "K = 5.2 is not saved (the file had 5).",
                "",
                "  r      read it again from disk; K = 5.2 stays, unsaved",
                "  a      save under another name (second.2.toml or one you type)",
                "  Esc/c  cancel",
            ],
            lines);
    }

    [Fact]
    public void A_gone_file_offers_another_name_or_writing_it_again_but_not_reading_it()
    {
        var state = Conflict(FileOnDisk.Missing);
        var lines = Trimmed(FileOverlayPresenter.SaveConflict(state, (SaveConflictOverlay)state.Overlay, Width, Glyphs.Ascii));
        Assert.StartsWith("second.toml is gone from disk: another program deleted or moved it.", lines[0], StringComparison.Ordinal);
        Assert.Contains("  w      write second.toml again where it was", lines);
        Assert.DoesNotContain(lines, l => l.StartsWith("  r ", StringComparison.Ordinal));
        Assert.Equal("a save under another name  w write it again  Esc cancel", KeyHints.Line(state, 200, Glyphs.Ascii));
    }

    [Fact]
    public void The_file_name_box_shows_the_path_with_a_cursor_and_the_last_problem()
    {
        var state = Update.Apply(Conflict(FileOnDisk.Changed), Command.SaveUnderAnotherName).State;
        state = Update.Apply(state, Command.Confirm).State with
        {
            Overlay = new SaveAsOverlay("/plants/x.txt", "K = 5.2", "n", false, "a plant file name ends in .toml (the library lists only those)"),
        };
        var lines = Trimmed(FileOverlayPresenter.SaveAs(state, (SaveAsOverlay)state.Overlay, Width, Glyphs.Unicode));
        Assert.Contains("> /plants/x.txt_", lines);
        Assert.Contains("! a plant file name ends in .toml (the library lists only those)", lines);
        Assert.Equal("Enter save  Esc cancel  Backspace delete", lines[^1]);
    }

    [Fact]
    public void A_long_path_shows_its_end()
    {
        var box = new SaveAsOverlay("/very/long/" + new string('d', 100) + "/plant.2.toml", "n", "n", false, null);
        var state = FilePlants.Unsaved() with { Overlay = box };
        string field = Trimmed(FileOverlayPresenter.SaveAs(state, box, 40, Glyphs.Unicode)).Single(l => l.StartsWith("> ", StringComparison.Ordinal));
        Assert.Equal(40, TextWidth.Of(field));
        Assert.EndsWith("/plant.2.toml_", field, StringComparison.Ordinal);
        Assert.StartsWith("> …", field, StringComparison.Ordinal);
    }

    [Fact]
    public void The_recovery_box_says_what_it_holds_when_it_was_written_and_the_choices()
    {
        var changed = new DateTimeOffset(2026, 3, 4, 5, 0, 0, TimeSpan.Zero);
        var file = new RecoveryFile(FilePlants.Path + ".recovery", changed.AddMinutes(20), changed, "K", 6.4, null);
        var state = Update.Receive(Update.Start(null, TestPlants.Folder).State, new PlantLoaded(FilePlants.SecondOrder()) { Recovery = file }).State;
        var lines = Trimmed(FileOverlayPresenter.Recovery(state, (RecoveryOverlay)state.Overlay, Width, Glyphs.Unicode));
        Assert.Equal(
            [
                "second.toml.recovery lies beside second.toml: termlocus kept an unsaved",
                "value there when it last ended abruptly.",
                "It was written 2026-03-04 05:20 UTC, after the plant file last changed.",
                "It holds K = 6.4; second.toml has 5.",
                "",
                "  a      apply K = 6.4 as an unsaved value (s then saves it)",
                "  d      discard it: delete the recovery file",
                "  k/Esc  keep it for later (offered again next time)",
            ],
            lines);
    }

    [Fact]
    public void An_older_or_broken_recovery_file_is_marked_and_a_broken_one_is_not_offered_for_applying()
    {
        var changed = new DateTimeOffset(2026, 3, 4, 5, 0, 0, TimeSpan.Zero);
        var start = Update.Start(null, TestPlants.Folder).State;
        var stale = new RecoveryFile(FilePlants.Path + ".recovery", changed.AddHours(-1), changed, "K", 6.4, null);
        var staleState = Update.Receive(start, new PlantLoaded(FilePlants.SecondOrder()) { Recovery = stale }).State;
        string staleText = string.Join(' ', Trimmed(FileOverlayPresenter.Recovery(staleState, (RecoveryOverlay)staleState.Overlay, Width, Glyphs.Ascii)));
        Assert.Contains("! Older than the plant file: written 2026-03-04 04:00 UTC, the plant file changed 2026-03-04 05:00 UTC; its value may be out of date.", staleText, StringComparison.Ordinal);
        Assert.Contains("  a      apply K = 6.4", staleText, StringComparison.Ordinal);

        var broken = stale with { Parameter = null, Value = null, Problem = "it is not a readable plant file: second.toml.recovery:2:6: error: invalid TOML" };
        var brokenState = Update.Receive(start, new PlantLoaded(FilePlants.SecondOrder()) { Recovery = broken }).State;
        var lines = Trimmed(FileOverlayPresenter.Recovery(brokenState, (RecoveryOverlay)brokenState.Overlay, Width, Glyphs.Ascii));
        Assert.Contains(lines, l => l.StartsWith("! It cannot be applied: it is not a readable plant file:", StringComparison.Ordinal));
        Assert.DoesNotContain(lines, l => l.StartsWith("  a ", StringComparison.Ordinal));
        Assert.Equal("d discard  k keep for later", KeyHints.Line(brokenState, 200, Glyphs.Ascii));
    }

    [Fact]
    public void The_panel_and_the_save_dialog_say_when_the_file_changed_on_disk()
    {
        var changed = FilePlants.Checked(FilePlants.Unsaved(), FileOnDisk.Changed);
        var panel = Trimmed(ParameterPanelPresenter.Lines(changed.Session, 30, 8, Glyphs.Unicode));
        Assert.Equal("! unsaved (file: 5)", panel[3]);
        Assert.Equal("! file changed on disk", panel[4]);
        Assert.Equal("! file gone from disk", ParameterPanelPresenter.DiskLine(FileOnDisk.Missing, Glyphs.Unicode));
        Assert.Null(ParameterPanelPresenter.DiskLine(FileOnDisk.AsLoaded, Glyphs.Unicode));

        var dialog = changed with { Overlay = new SaveOverlay("K = 5.2", "n", false) };
        var lines = Trimmed(OverlayPresenter.SaveDialog(dialog, (SaveOverlay)dialog.Overlay, Width, Glyphs.Unicode));
        Assert.Contains("! second.toml changed on disk: Enter asks what to do", lines);
    }

    [Fact]
    public void Help_lists_the_new_choices_under_their_own_headings()
    {
        var help = HelpPresenter.Lines(Glyphs.Unicode, 100);
        Assert.Contains("When the plant file changed on disk or is gone (s asks)", help);
        Assert.Contains("Recovery file found on opening a plant", help);
        Assert.Contains(help, l => l.StartsWith("  r ", StringComparison.Ordinal) && l.Contains("read the file again from disk, keeping the swept value", StringComparison.Ordinal));
        Assert.Contains(help, l => l.StartsWith("  d ", StringComparison.Ordinal) && l.Contains("discard it (delete the recovery file)", StringComparison.Ordinal));
    }
}
