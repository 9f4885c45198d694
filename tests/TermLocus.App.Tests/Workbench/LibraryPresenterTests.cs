using System.Collections.Immutable;
using TermLocus.App.Text;
using TermLocus.App.Workbench;

namespace TermLocus.App.Tests.Workbench;

public class LibraryPresenterTests
{
    private static string Pad(string s) => TextWidth.PadRight(s, 70);

    [Fact]
    public void Each_file_shows_its_verdict_in_words_its_name_and_title_or_error()
    {
        var library = new LibraryState("/plants", TestPlants.LibraryItems(), true);
        var lines = LibraryPresenter.Lines(library, 1, "/plants/second.toml", 70, 5, Glyphs.Unicode);
        Assert.Equal(
            [
                Pad("folder: /plants"),
                Pad("  ! FAIL   crane.toml   Gantry crane sway"),
                Pad("▸ ✓ pass   second.toml  Textbook second-order loop  (open)"),
                Pad("  ! ERROR  broken.toml  broken.toml:3:7: error: expected '='"),
            ],
            lines.ToArray());
    }

    [Fact]
    public void A_long_list_scrolls_to_keep_the_selection_visible()
    {
        var items = Enumerable.Range(0, 10)
            .Select(i => new LibraryItem($"/p/f{i}.toml", $"f{i}.toml", $"Plant {i}", LibraryVerdict.Pass, null))
            .ToImmutableArray();
        var lines = LibraryPresenter.Lines(new LibraryState("/p", items, true), 7, null, 40, 4, Glyphs.Ascii);
        Assert.Equal(["folder: /p", "  ok pass  f5.toml  Plant 5", "  ok pass  f6.toml  Plant 6", "> ok pass  f7.toml  Plant 7"],
            lines.Select(l => l.TrimEnd()));
    }

    [Fact]
    public void File_names_and_titles_with_escape_sequences_are_made_visible()
    {
        var items = ImmutableArray.Create(new LibraryItem("/p/x.toml", "x\u009b31m.toml", "T\u001b[2Jitle", LibraryVerdict.Pass, null));
        var line = LibraryPresenter.Lines(new LibraryState("/p", items, true), 0, null, 60, 2, Glyphs.Ascii)[1];
        Assert.Equal("> ok pass  x<U+009B>31m.toml  T^[[2Jitle", line.TrimEnd());
    }

    [Fact]
    public void Empty_and_unscanned_folders_say_so()
    {
        Assert.Equal("  no plant files (*.toml) in this folder",
            LibraryPresenter.Lines(new LibraryState("/p", [], true), 0, null, 60, 3, Glyphs.Ascii)[1].TrimEnd());
        Assert.Equal("  reading the folder~",
            LibraryPresenter.Lines(LibraryState.Unscanned("/p"), 0, null, 60, 3, Glyphs.Ascii)[1].TrimEnd());
    }
}
