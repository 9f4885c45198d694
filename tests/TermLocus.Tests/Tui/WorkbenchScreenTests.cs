using TermLocus.App.Canvas;
using TermLocus.App.Workbench;
using Terminal.Gui.Input;
using Command = TermLocus.App.Workbench.Command;

namespace TermLocus.Tests.Tui;

[Collection(TerminalGuiCollection.Name)]
public class WorkbenchScreenTests
{
    [Fact]
    public void Compact_80x24_main_screen()
    {
        using var h = ScreenHarness.Start(80, 24).WithSecondOrder();
        Snapshot.Match("compact-80x24-main", h.Screen());
    }

    [Fact]
    public void Roomy_160x48_main_screen()
    {
        using var h = ScreenHarness.Start(160, 48).WithSecondOrder();
        Snapshot.Match("roomy-160x48-main", h.Screen());
    }

    [Fact]
    public void Stepping_with_the_arrow_key_updates_table_panel_and_status()
    {
        using var h = ScreenHarness.Start(80, 24).WithSecondOrder();
        h.Press(Key.CursorRight, Key.CursorRight, Key.CursorRight);
        // K = 2.6: s² + 2s + 2.6 = 0 gives -1 ± j√1.6 = -1 ± j1.265, ζ = 1/√2.6 = 0.6202 (quadratic formula).
        Assert.Contains("-1.000 ± j1.265   0.6202", h.Screen(), StringComparison.Ordinal);
        Snapshot.Match("compact-80x24-stepped", h.Screen());
    }

    [Fact]
    public void Help_overlay_lists_the_keys_and_escape_closes_it()
    {
        using var h = ScreenHarness.Start(80, 24).WithSecondOrder();
        h.Press(new Key('?'));
        Snapshot.Match("compact-80x24-help", h.Screen());
        h.Press(Key.Esc);
        Assert.IsType<NoOverlay>(h.Controller.State.Overlay);
        Assert.False(h.Quit);
    }

    [Fact]
    public void Typing_a_value_shows_the_box_then_the_violation()
    {
        using var h = ScreenHarness.Start(80, 24).WithSecondOrder();
        h.Press(new Key('='));
        h.Type("7.5");
        Snapshot.Match("compact-80x24-value-entry", h.Screen());
        h.Press(Key.Enter);
        // K = 7.5: ζ = 1/√7.5 = 0.3651 < 0.5, so the pair row is marked and the status names the spec.
        Snapshot.Match("compact-80x24-after-value", h.Screen());
    }

    [Fact]
    public void Library_overlay_lists_files_with_verdicts()
    {
        using var h = ScreenHarness.Start(80, 24).WithSecondOrder();
        h.Press(new Key('o'));
        Snapshot.Match("compact-80x24-library", h.Screen());
        Assert.Contains(new ScanLibraryEffect(ScreenPlants.Folder), h.Effects);
    }

    [Fact]
    public void Quit_with_an_unsaved_value_asks_first()
    {
        using var h = ScreenHarness.Start(80, 24).WithSecondOrder();
        h.Press(Key.CursorRight, new Key('q'));
        Snapshot.Match("compact-80x24-quit-confirm", h.Screen());
        Assert.False(h.Quit);
        h.Press(new Key('d'));
        Assert.True(h.Quit);
    }

    [Fact]
    public void Escape_never_quits_the_main_screen()
    {
        using var h = ScreenHarness.Start(80, 24).WithSecondOrder();
        string before = h.Screen();
        h.Press(Key.Esc, Key.Esc);
        Assert.False(h.Quit);
        Assert.Equal(before, h.Screen());
    }

    [Fact]
    public void Q_quits_at_once_when_nothing_is_unsaved()
    {
        using var h = ScreenHarness.Start(80, 24).WithSecondOrder();
        h.Press(new Key('q'));
        Assert.True(h.Quit);
    }

    [Fact]
    public void Ctrl_c_writes_the_recovery_file_for_an_unsaved_value_and_quits()
    {
        using var h = ScreenHarness.Start(80, 24).WithSecondOrder();
        h.Press(Key.CursorRight, Key.C.WithCtrl);
        Assert.True(h.Quit);
        Assert.Contains(h.Effects, e => e is SaveRecoveryEffect { Value: 2.2 });
    }

    [Fact]
    public void Too_small_says_what_it_needs_and_q_still_works()
    {
        using var h = ScreenHarness.Start(50, 15).WithSecondOrder();
        Snapshot.Match("too-small-50x15", h.Screen());
        h.Press(new Key('q'));
        Assert.True(h.Quit);
    }

    [Fact]
    public void Growing_the_window_switches_to_the_roomy_layout_live()
    {
        using var h = ScreenHarness.Start(50, 15).WithSecondOrder();
        h.Resize(160, 48);
        Assert.Equal(LayoutMode.Roomy, h.ScreenView.CurrentLayout.Mode);
        Snapshot.Match("roomy-160x48-main", h.Screen());
    }

    [Fact]
    public void Ascii_symbols_at_80x24()
    {
        using var h = ScreenHarness.Start(80, 24, CanvasSymbols.Ascii).WithSecondOrder();
        Snapshot.Match("ascii-80x24-main", h.Screen());
    }

    [Fact]
    public void Tab_moves_focus_to_the_pole_table_and_arrows_select_rows()
    {
        using var h = ScreenHarness.Start(80, 24).WithSecondOrder(k: 0.5);
        h.Press(Key.Tab, Key.CursorDown);
        Assert.Equal(Pane.Poles, h.Controller.State.Focus);
        Assert.Equal(1, h.Controller.State.Session!.SelectedPole);
        Snapshot.Match("compact-80x24-poles-focused", h.Screen());
    }

    [Fact]
    public void The_plane_is_drawn_only_when_its_inputs_change()
    {
        using var h = ScreenHarness.Start(80, 24).WithSecondOrder();
        int drawn = h.ScreenView.PlaneDrawCount;
        h.Press(new Key('x'), new Key('['));   // an unbound key, then a finer step: nothing on the plane changes
        Assert.Equal(drawn, h.ScreenView.PlaneDrawCount);
        h.Press(Key.CursorRight);
        Assert.Equal(drawn + 1, h.ScreenView.PlaneDrawCount);
    }

    [Fact]
    public void Closing_an_overlay_brings_back_exactly_the_screen_under_it()
    {
        using var h = ScreenHarness.Start(80, 24).WithSecondOrder();
        h.Press(Key.CursorRight);
        string before = h.Screen();
        foreach (var key in new[] { new Key('?'), new Key('o'), new Key('=') })
        {
            h.Press(key);
            Assert.NotEqual(before, h.Screen());
            h.Press(Key.Esc);
            Assert.Equal(before, h.Screen());
        }
    }

    [Fact]
    public void Stepping_then_stepping_back_restores_every_cell()
    {
        using var h = ScreenHarness.Start(160, 48).WithSecondOrder(k: 3.6);
        string before = h.Screen();
        h.Press(Key.CursorRight, Key.CursorRight, Key.CursorLeft, Key.CursorLeft);
        Assert.Equal(before, h.Screen());
    }

    [Fact]
    public void Without_colour_only_the_terminals_own_colours_and_styles_are_sent()
    {
        using var mono = ScreenHarness.Start(80, 24, colour: false).WithSecondOrder(k: 7.5);
        Assert.DoesNotMatch(@"\e\[(3[0-7]|9[0-7]|38;|4[0-7]|10[0-7]|48;)", mono.Ansi());
        using var colour = ScreenHarness.Start(80, 24).WithSecondOrder(k: 7.5);
        Assert.Matches(@"\e\[9[0-7]m", colour.Ansi());
    }
}
