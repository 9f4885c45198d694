using TermLocus.Tui;

namespace TermLocus.Tests.Tui;

[Collection(TerminalGuiCollection.Name)]
public class WorkbenchAppTests
{
    [Fact]
    public void Bad_symbols_are_refused_before_the_screen_is_touched()
    {
        var stderr = new StringWriter();
        Assert.Equal(2, WorkbenchApp.Run(new WorkbenchOptions(Symbols: "sixel"), stderr));
        Assert.Equal("termlocus: error: --symbols must be braille or ascii, not 'sixel'" + Environment.NewLine, stderr.ToString());
    }

    [Fact]
    public void Without_a_terminal_it_points_to_the_verbs()
    {
        // Under the test runner standard input and output are redirected, as in a pipe or a CI job.
        Assert.True(Console.IsInputRedirected || Console.IsOutputRedirected);
        var stderr = new StringWriter();
        Assert.Equal(2, WorkbenchApp.Run(new WorkbenchOptions(), stderr));
        Assert.Contains("the workbench needs a terminal", stderr.ToString(), StringComparison.Ordinal);
    }
}
