using System.Diagnostics;
using TermLocus.Tui;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;

namespace TermLocus.Tests.Tui;

[Collection(TerminalGuiCollection.Name)]
public class QuietAnsiInputTests
{
    [Fact]
    public void The_quiet_input_becomes_the_input_a_new_application_creates()
    {
        // Guards the one place that reaches into the toolkit: if a Terminal.Gui update renames the factory field, the
        // installer silently falls back, and this test says so.
        if (!OperatingSystem.IsLinux())
        {
            return; // Linux only (eventfd).
        }

        using var app = Application.Create();
        using var input = QuietInputInstaller.TryInstall(app);

        Assert.NotNull(input);
        var factory = Assert.IsAssignableFrom<IComponentFactory<char>>(QuietInputInstaller.InstalledFactory(app));
        Assert.Same(input, factory.CreateInput());
    }

    [Fact]
    public void A_woken_input_stops_waiting_for_keys()
    {
        // The toolkit's shutdown waits for its input loop; after WakeUp a Peek must not sit out its longest wait.
        if (!OperatingSystem.IsLinux())
        {
            return; // Linux only (eventfd).
        }

        using var input = new QuietAnsiInput();
        Assert.True(input.CanWait);
        input.WakeUp();

        var clock = Stopwatch.StartNew();
        for (int i = 0; i < 4; i++)
        {
            _ = input.Peek();
        }

        Assert.True(clock.ElapsedMilliseconds < QuietAnsiInput.LongestWait, $"four woken peeks took {clock.ElapsedMilliseconds} ms");
    }
}
