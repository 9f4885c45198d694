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
}
