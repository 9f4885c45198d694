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

    [Fact]
    public void Help_names_the_keys_that_need_shift_and_ctrl_as_the_key_table_has_them()
    {
        // Read off the key table independently: every capital letter bound is typed with Shift.
        var capitals = KeyMap.Bindings.Select(b => b.Key).Where(k => k.Special == SpecialKey.None && !k.Ctrl && char.IsUpper(k.Character))
            .Select(k => k.Character).Distinct().ToList();
        Assert.Contains('Z', capitals);
        string heading = HelpPresenter.KeysHeading();
        Assert.Equal("Keys: capital letters (G H J K L Z) are typed with Shift; Ctrl is only for Ctrl+C; no key needs Alt, and arrows need no modifier", heading);
        Assert.All(capitals, c => Assert.Contains(c.ToString(), heading, StringComparison.Ordinal));
        Assert.DoesNotContain("never needed", string.Join('\n', HelpPresenter.Lines(Glyphs.Unicode, 80)), StringComparison.Ordinal);
    }

    [Fact]
    public void Wrapping_never_breaks_inside_a_band_point_phrase()
    {
        // The save dialog's verdict used to end a line with "(with zh -25" and start the next with "%)"; word by word,
        // 35 columns do exactly that here.
        Assert.Equal(["least margin 0.02373 s", "(with zh -25 %)"], HelpPresenter.Wrap("least margin 0.02373 s (with zh -25 %)", 35).ToList());
        Assert.Equal(["at zh -25 %", "and more"], HelpPresenter.Wrap("at zh -25 % and more", 11).ToList());
    }
}
