using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class OverlayUpdateTests
{
    private static WorkbenchState Type(WorkbenchState state, string text)
    {
        foreach (char c in text)
        {
            state = Update.Receive(state, new CharacterTyped(c)).State;
        }

        return state;
    }

    [Fact]
    public void Typing_a_value_sets_it_exactly()
    {
        var open = Update.Apply(TestPlants.Opened(), Command.EnterValue).State;
        Assert.Equal(new ValueEntryOverlay(string.Empty, null), open.Overlay);
        var typed = Type(open, "7.25");
        Assert.Equal("7.25", ((ValueEntryOverlay)typed.Overlay).Text);
        var (state, effects) = Update.Apply(typed, Command.Confirm);
        Assert.Empty(effects);
        Assert.Equal(Overlay.None, state.Overlay);
        Assert.Equal(7.25, state.Session!.Sweep.Value);
    }

    [Fact]
    public void Exponent_notation_is_accepted()
    {
        var state = Update.Apply(Type(Update.Apply(TestPlants.Opened(), Command.EnterValue).State, "4.7e-3"), Command.Confirm).State;
        Assert.Equal(0.0047, state.Session!.Sweep.Value, 1e-15);
    }

    [Fact]
    public void Backspace_deletes_the_last_character()
    {
        var state = Type(Update.Apply(TestPlants.Opened(), Command.EnterValue).State, "12x");
        state = Update.Apply(state, Command.DeleteBackward).State;
        Assert.Equal("12", ((ValueEntryOverlay)state.Overlay).Text);
    }

    [Fact]
    public void Text_that_is_not_a_number_is_refused_with_a_reason_and_the_box_stays()
    {
        var state = Update.Apply(Type(Update.Apply(TestPlants.Opened(), Command.EnterValue).State, "1,5"), Command.Confirm).State;
        Assert.Equal(new ValueEntryOverlay("1,5", "not a number: '1,5'"), state.Overlay);
        Assert.Equal(5.0, state.Session!.Sweep.Value);
        var empty = Update.Apply(Update.Apply(TestPlants.Opened(), Command.EnterValue).State, Command.Confirm).State;
        Assert.Equal("type a number, e.g. 1.25 or 4.7e-3", ((ValueEntryOverlay)empty.Overlay).Problem);
    }

    [Fact]
    public void A_value_outside_the_range_is_taken_with_a_warning()
    {
        var state = Update.Apply(Type(Update.Apply(TestPlants.Opened(), Command.EnterValue).State, "25"), Command.Confirm).State;
        Assert.Equal(25.0, state.Session!.Sweep.Value);
        Assert.Equal("K = 25 is outside the traced range [0, 20]", state.Message!.Text);
    }

    [Fact]
    public void Escape_closes_the_value_box_without_changing_the_value()
    {
        var state = Update.Apply(Type(Update.Apply(TestPlants.Opened(), Command.EnterValue).State, "9"), Command.Cancel).State;
        Assert.Equal(Overlay.None, state.Overlay);
        Assert.Equal(5.0, state.Session!.Sweep.Value);
    }

    [Fact]
    public void Characters_typed_outside_the_value_box_do_nothing()
    {
        var state = TestPlants.Opened();
        Assert.Equal(state, Update.Receive(state, new CharacterTyped('7')).State);
    }

    [Fact]
    public void The_value_box_has_a_length_limit()
    {
        var state = Type(Update.Apply(TestPlants.Opened(), Command.EnterValue).State, new string('1', 60));
        Assert.Equal(40, ((ValueEntryOverlay)state.Overlay).Text.Length);
    }

    [Fact]
    public void Help_opens_scrolls_and_closes()
    {
        var help = Update.Apply(TestPlants.Opened(), Command.ShowHelp).State;
        Assert.Equal(new HelpOverlay(0), help.Overlay);
        Assert.Equal(new HelpOverlay(0), Update.Apply(help, Command.MoveUp).State.Overlay);
        Assert.Equal(new HelpOverlay(2), TestPlants.Run(help, Command.MoveDown, Command.MoveDown).State.Overlay);
        var bottom = TestPlants.Run(help, Enumerable.Repeat(Command.MoveDown, 500).ToArray()).State;
        Assert.Equal(new HelpOverlay(HelpPresenter.LineCount - 1), bottom.Overlay);
        Assert.Equal(Overlay.None, Update.Apply(help, Command.Cancel).State.Overlay);
    }

    [Fact]
    public void The_library_opens_on_the_current_plant_and_scans_again()
    {
        var state = Update.Receive(TestPlants.Opened(), new LibraryScanned(TestPlants.Folder, TestPlants.LibraryItems())).State;
        var (open, effects) = Update.Apply(state, Command.OpenLibrary);
        Assert.Equal(new LibraryOverlay(1), open.Overlay);
        Assert.Equal<Effect>([new ScanLibraryEffect(TestPlants.Folder)], effects);
    }

    [Fact]
    public void Without_a_library_folder_the_library_explains_itself()
    {
        var (state, effects) = Update.Apply(WorkbenchState.Initial(null), Command.OpenLibrary);
        Assert.Empty(effects);
        Assert.Equal(Overlay.None, state.Overlay);
        Assert.StartsWith("no library folder", state.Message!.Text);
    }

    [Fact]
    public void Moving_in_the_library_stays_inside_the_list()
    {
        var state = Update.Receive(TestPlants.Opened(), new LibraryScanned(TestPlants.Folder, TestPlants.LibraryItems())).State
            with { Overlay = new LibraryOverlay(0) };
        Assert.Equal(new LibraryOverlay(0), Update.Apply(state, Command.MoveUp).State.Overlay);
        Assert.Equal(new LibraryOverlay(2), TestPlants.Run(state, Command.MoveDown, Command.MoveDown, Command.MoveDown).State.Overlay);
    }

    [Fact]
    public void Confirming_in_the_library_loads_the_selected_file()
    {
        var state = Update.Receive(TestPlants.Opened(), new LibraryScanned(TestPlants.Folder, TestPlants.LibraryItems())).State
            with { Overlay = new LibraryOverlay(0) };
        var (next, effects) = Update.Apply(state, Command.Confirm);
        Assert.Equal<Effect>([new LoadPlantEffect(TestPlants.Folder + "/crane.toml")], effects);
        Assert.Equal(Overlay.None, next.Overlay);
        Assert.Equal("opening crane.toml", next.Message!.Text);
    }

    [Fact]
    public void Confirming_the_open_plant_just_closes_the_library()
    {
        var state = Update.Receive(TestPlants.Opened(), new LibraryScanned(TestPlants.Folder, TestPlants.LibraryItems())).State
            with { Overlay = new LibraryOverlay(1) };
        var (next, effects) = Update.Apply(state, Command.Confirm);
        Assert.Empty(effects);
        Assert.Equal(Overlay.None, next.Overlay);
    }

    [Fact]
    public void Another_plant_is_not_opened_over_an_unsaved_value()
    {
        var state = Update.Receive(TestPlants.Run(TestPlants.Opened(), Command.StepSweepUp).State, new LibraryScanned(TestPlants.Folder, TestPlants.LibraryItems())).State
            with { Overlay = new LibraryOverlay(0) };
        var (next, effects) = Update.Apply(state, Command.Confirm);
        Assert.Empty(effects);
        Assert.Equal(new LibraryOverlay(0), next.Overlay);
        Assert.Equal("K = 5.2 is not saved: Esc, then s saves or r reverts it", next.Message!.Text);
    }

    [Fact]
    public void Escape_on_the_main_screen_clears_the_message_and_never_quits()
    {
        var withMessage = Update.Apply(TestPlants.Opened(), Command.JumpToNextBoundary).State;
        Assert.NotNull(withMessage.Message);
        var (state, effects) = Update.Apply(withMessage, Command.Cancel);
        Assert.Empty(effects);
        Assert.Null(state.Message);
        Assert.Equal(Overlay.None, state.Overlay);
    }
}
