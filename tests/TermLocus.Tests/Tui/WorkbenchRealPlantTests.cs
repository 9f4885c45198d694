using System.Runtime.CompilerServices;
using TermLocus.App.Workbench;
using Terminal.Gui.Input;
using Command = TermLocus.App.Workbench.Command;

namespace TermLocus.Tests.Tui;

/// <summary>The workbench through the whole stack: real plant files read, traced, checked and saved.</summary>
[Collection(TerminalGuiCollection.Name)]
public sealed class WorkbenchRealPlantTests : IDisposable
{
    private readonly string folder = Path.Combine(Path.GetTempPath(), "termlocus-tui-" + Guid.NewGuid().ToString("N"));

    public WorkbenchRealPlantTests()
    {
        Directory.CreateDirectory(folder);
        foreach (var file in Directory.GetFiles(DemoPlants(), "*.toml"))
        {
            File.Copy(file, Path.Combine(folder, Path.GetFileName(file)));
        }
    }

    public void Dispose() => Directory.Delete(folder, recursive: true);

    [Fact]
    public void A_folder_opens_on_the_library_with_a_verdict_for_each_demo_plant()
    {
        using var h = ScreenHarness.OnFolder(100, 30, folder);
        var overlay = Assert.IsType<LibraryOverlay>(h.Controller.State.Overlay);
        Assert.Equal(0, overlay.Selected);
        string screen = h.Screen();
        Assert.Contains("conveyor-speed.toml", screen, StringComparison.Ordinal);
        Assert.Contains("FAIL", screen, StringComparison.Ordinal);   // the magnetic bearing fails as shipped
        h.Press(Key.Enter);
        Assert.Equal("conveyor-speed.toml", Path.GetFileName(h.Controller.State.Session!.Loaded.Plant.Path));
        Assert.NotNull(h.Controller.State.Session.Locus);
    }

    [Fact]
    public void The_magnetic_bearing_fails_as_shipped_and_the_screen_says_which_spec()
    {
        using var h = ScreenHarness.OnFolder(80, 24, folder, Path.Combine(folder, "magnetic-bearing.toml"));
        h.Controller.Dispatch(Command.Cancel);
        h.Press(Key.Esc);
        Snapshot.Match("real-magnetic-bearing-80x24", h.Screen().Replace(folder, "<folder>", StringComparison.Ordinal));
    }

    [Fact]
    public void Saving_writes_the_value_and_an_operating_point_and_then_quit_asks_nothing()
    {
        string path = Path.Combine(folder, "conveyor-speed.toml");
        string before = File.ReadAllText(path);
        using var h = ScreenHarness.OnFolder(80, 24, folder, path);
        h.Press(Key.CursorRight, Key.CursorRight, new Key('s'));
        Snapshot.Match("real-conveyor-save-dialog-80x24", h.Screen());
        Assert.Equal(before, File.ReadAllText(path)); // the dialog writes nothing yet
        h.Type(" bench 3");
        h.Press(Key.Tab);
        h.Type("; full belt");
        h.Press(Key.Enter);
        string after = File.ReadAllText(path);
        Assert.Contains("name = \"Kp = 8 bench 3\"", after, StringComparison.Ordinal);
        Assert.Contains("note = \"saved from the workbench; full belt\"", after, StringComparison.Ordinal);
        Assert.Contains("verdict = \"pass ok every spec met across the band; least margin", after, StringComparison.Ordinal);
        Assert.NotEqual(before, after);
        Assert.Contains("value = 8.0", after, StringComparison.Ordinal);
        Assert.Contains("[[operating_points]]", after, StringComparison.Ordinal);
        Assert.Contains("by = \"tester@bench\"", after, StringComparison.Ordinal);
        Assert.False(h.Controller.State.Unsaved);
        h.Press(new Key('q'));
        Assert.True(h.Quit);
    }

    [Fact]
    public void Ctrl_c_leaves_the_plant_alone_and_writes_the_recovery_file_beside_it()
    {
        string path = Path.Combine(folder, "conveyor-speed.toml");
        string before = File.ReadAllText(path);
        using var h = ScreenHarness.OnFolder(80, 24, folder, path);
        h.Press(Key.CursorRight, Key.C.WithCtrl);
        Assert.True(h.Quit);
        Assert.Equal(before, File.ReadAllText(path));
        Assert.Contains("value = 7.0", File.ReadAllText(path + ".recovery"), StringComparison.Ordinal);
    }

    private static string DemoPlants([CallerFilePath] string here = "") =>
        Path.GetFullPath(Path.Combine(Path.GetDirectoryName(here)!, "..", "..", "..", "plants"));
}
