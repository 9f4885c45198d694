using TermLocus.Tui;
using Terminal.Gui.App;

namespace TermLocus.Tests.Tui;

[Collection(TerminalGuiCollection.Name)]
public class MainLoopPacerTests
{
    [Fact]
    public void It_takes_the_toolkits_pause_away_and_gives_it_back()
    {
        ushort before = Application.MaximumIterationsPerSecond;
        using var app = Application.Create();
        using (new MainLoopPacer(app))
        {
            // A turn budget of 1 ms: the toolkit's own sleep rounds to zero whole milliseconds and is skipped.
            Assert.Equal(1000, Application.MaximumIterationsPerSecond);
        }

        Assert.Equal(before, Application.MaximumIterationsPerSecond);
    }
}
