using System.Collections.Concurrent;
using System.Runtime.CompilerServices;
using TermLocus.App.Workbench;
using TermLocus.Tui;
using Terminal.Gui.Input;

namespace TermLocus.Tests.Tui;

/// <summary>
/// The plant file changed, deleted or left with a recovery file while the workbench has it open, through the whole
/// stack (real files in a temporary folder, every effect performed).
/// </summary>
[Collection(TerminalGuiCollection.Name)]
public sealed class WorkbenchFileTests : IDisposable
{
    private readonly string folder = Path.Combine(Path.GetTempPath(), "termlocus-tui-files-" + Guid.NewGuid().ToString("N"));

    public WorkbenchFileTests()
    {
        Directory.CreateDirectory(folder);
        File.Copy(Path.Combine(DemoPlants(), "conveyor-speed.toml"), Conveyor);
    }

    private string Conveyor => Path.Combine(folder, "conveyor-speed.toml");

    public void Dispose() => Directory.Delete(folder, recursive: true);

    [Fact]
    public void A_file_changed_on_disk_is_never_saved_over_and_can_be_saved_under_another_name()
    {
        using var h = ScreenHarness.OnFolder(80, 24, folder, Conveyor);
        h.Press(Key.CursorRight, Key.CursorRight);
        File.AppendAllText(Conveyor, "# edited by someone else\n");
        string edited = File.ReadAllText(Conveyor);
        h.Press(new Key('s')); // the save dialog looks at the file and turns into the choice
        Snapshot.Match("real-conveyor-changed-on-disk-80x24", h.Screen().Replace(folder, "<folder>", StringComparison.Ordinal));
        Assert.Equal(edited, File.ReadAllText(Conveyor));

        h.Press(new Key('a'));
        Assert.Equal(Path.Combine(folder, "conveyor-speed.2.toml"), Assert.IsType<SaveAsOverlay>(h.Controller.State.Overlay).Path);
        Assert.Contains("/conveyor-speed.2.toml_", h.Screen(), StringComparison.Ordinal);
        h.Press(Key.Enter);
        string written = File.ReadAllText(Path.Combine(folder, "conveyor-speed.2.toml"));
        Assert.Contains("Kp    = { value = 8.0,", written, StringComparison.Ordinal);
        Assert.DoesNotContain("edited by someone else", written, StringComparison.Ordinal);
        Assert.Equal(edited, File.ReadAllText(Conveyor));
        Assert.Contains("saved Kp = 8 to conveyor-speed.2.toml, now the open file", h.Screen(), StringComparison.Ordinal);
        Assert.False(h.Controller.State.Unsaved);
    }

    [Fact]
    public void A_file_read_again_keeps_the_value_and_a_broken_one_leaves_the_session()
    {
        using var h = ScreenHarness.OnFolder(80, 24, folder, Conveyor);
        h.Press(Key.CursorRight);
        File.WriteAllText(Conveyor, File.ReadAllText(Conveyor).Replace("value = 0.42", "value = 0.40", StringComparison.Ordinal));
        h.Press(new Key('s'), new Key('r'));
        Assert.Contains("J = 0.4 kg*m^2 (nominal)", h.Screen(), StringComparison.Ordinal);
        Assert.Contains("read conveyor-speed.toml again; kept Kp = 7, not saved yet", h.Screen(), StringComparison.Ordinal);

        File.AppendAllText(Conveyor, "Kp = = broken\n");
        h.Press(new Key('s'), new Key('r'));
        Assert.Contains("conveyor-speed.toml:28:6: error:", h.Screen(), StringComparison.Ordinal);
        Assert.Equal(7.0, h.Controller.State.Session!.Sweep.Value);
        Assert.Contains("Kp = 7 A/(rad/s)", h.Screen(), StringComparison.Ordinal);
    }

    [Fact]
    public void A_deleted_file_is_written_again_only_when_asked()
    {
        using var h = ScreenHarness.OnFolder(80, 24, folder, Conveyor);
        h.Press(Key.CursorRight);
        File.Delete(Conveyor);
        h.Press(new Key('s'));
        string screen = h.Screen();
        Assert.Contains("conveyor-speed.toml is gone from disk", screen, StringComparison.Ordinal);
        Assert.Contains("w      write conveyor-speed.toml again where it was", screen, StringComparison.Ordinal);
        Assert.False(File.Exists(Conveyor));
        h.Press(new Key('w'));
        Assert.Contains("Kp    = { value = 7.0,", File.ReadAllText(Conveyor), StringComparison.Ordinal);
    }

    [Fact]
    public void A_recovery_file_is_offered_on_the_next_open_and_applied_as_an_unsaved_value()
    {
        using (var first = ScreenHarness.OnFolder(80, 24, folder, Conveyor))
        {
            first.Press(Key.CursorRight, Key.CursorRight, Key.CursorRight, Key.C.WithCtrl);
            Assert.True(first.Quit);
        }

        using var h = ScreenHarness.OnFolder(80, 24, folder, Conveyor);
        string offered = h.Screen();
        Assert.Contains("recovery file found", offered, StringComparison.Ordinal);
        Assert.Contains("It holds Kp = 9; conveyor-speed.toml has 6.", offered, StringComparison.Ordinal);
        h.Press(new Key('a'));
        Assert.Contains("Kp = 9 A/(rad/s)", h.Screen(), StringComparison.Ordinal);
        Assert.Contains("! unsaved (file: 6)", h.Screen(), StringComparison.Ordinal);
        Assert.Contains("value = 6.0", File.ReadAllText(Conveyor), StringComparison.Ordinal);

        h.Press(new Key('s'), Key.Enter);
        Assert.Contains("value = 9.0", File.ReadAllText(Conveyor), StringComparison.Ordinal);
        Assert.False(File.Exists(Conveyor + ".recovery"));
    }

    [Fact]
    public void The_watch_reports_a_write_by_another_program_and_the_status_line_says_so()
    {
        using var h = ScreenHarness.OnFolder(80, 24, folder, Conveyor);
        var posted = new BlockingCollection<Action>();
        using var watch = new PlantFileWatch(h.Controller, posted.Add);
        File.AppendAllText(Conveyor, "# edited by someone else\n");
        Assert.True(posted.TryTake(out var touched, TimeSpan.FromSeconds(10)), "no touch reported");
        touched!();
        h.Press();
        Assert.Equal(FileOnDisk.Changed, h.Controller.State.Session!.Disk);
        Assert.Contains("conveyor-speed.toml changed on disk; s lets you choose what to do", h.Screen(), StringComparison.Ordinal);
        Assert.Contains("! file changed on disk", h.Screen(), StringComparison.Ordinal);
    }

    private static string DemoPlants([CallerFilePath] string here = "") =>
        Path.GetFullPath(Path.Combine(Path.GetDirectoryName(here)!, "..", "..", "..", "plants"));
}
