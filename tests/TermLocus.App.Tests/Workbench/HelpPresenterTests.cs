using TermLocus.App.Text;
using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class HelpPresenterTests
{
    [Fact]
    public void Help_lists_every_binding_from_the_key_table()
    {
        var text = string.Join('\n', HelpPresenter.Lines(Glyphs.Unicode, 100));
        foreach (var binding in KeyMap.Bindings)
        {
            Assert.Contains(binding.Description, text, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Help_groups_keys_of_a_command_on_one_line()
    {
        var lines = HelpPresenter.Lines(Glyphs.Unicode, 80);
        Assert.Contains("  ←  h              step the swept value down", lines);
        Assert.Contains("  Esc  ?  q  Enter  close the help", lines);
        Assert.Contains("  Ctrl+C            quit at once, keeping an unsaved value in a recovery file", lines);
    }

    [Fact]
    public void Help_ends_with_the_caution_wrapped_to_the_width()
    {
        var lines = HelpPresenter.Lines(Glyphs.Ascii, 60);
        string tail = string.Join(' ', lines.SkipWhile(l => !l.StartsWith("Caution", StringComparison.Ordinal)));
        Assert.Equal(HelpPresenter.Caution, tail);
        Assert.Contains("no substitute for a safe commissioning procedure", HelpPresenter.Caution, StringComparison.Ordinal);
        Assert.Contains("local codes", HelpPresenter.Caution, StringComparison.Ordinal);
        Assert.Contains("licensed engineering practice", HelpPresenter.Caution, StringComparison.Ordinal);
        Assert.All(lines, l => Assert.True(TextWidth.Of(l) <= 60, l));
    }
}
