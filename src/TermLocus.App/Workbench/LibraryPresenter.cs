using System.Collections.Immutable;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

#pragma warning disable CS8524 // every named value is handled; see Update.

/// <summary>
/// The plant library list: one line per file with its verdict in words (pass, FAIL, ERROR), its name and its title,
/// or the first line of its error. The selected file is marked with a glyph as well as drawn highlighted.
/// </summary>
public static class LibraryPresenter
{
    private const int VerdictWidth = 6;

    /// <summary>
    /// At most <paramref name="height"/> lines of exactly <paramref name="width"/> columns: a heading with the folder,
    /// then the files, scrolled so <paramref name="selected"/> is visible.
    /// </summary>
    public static ImmutableArray<string> Lines(LibraryState library, int selected, string? currentPath, int width, int height, Glyphs glyphs)
    {
        var lines = new List<string> { "folder: " + SafeText.Visible(library.Folder ?? "(none)") };
        if (!library.Scanned)
        {
            lines.Add("  reading the folder" + glyphs.Ellipsis);
        }
        else if (library.Items.IsEmpty)
        {
            lines.Add("  no plant files (*.toml) in this folder");
        }
        else
        {
            int room = Math.Max(1, height - 1);
            int nameWidth = Math.Min(Math.Max(12, width / 2 - 10), library.Items.Max(i => TextWidth.Of(SafeText.Visible(i.FileName))));
            int first = Math.Clamp(selected - room + 1, 0, Math.Max(0, library.Items.Length - room));
            for (int i = first; i < Math.Min(library.Items.Length, first + room); i++)
            {
                lines.Add(Item(library.Items[i], i == selected, library.Items[i].Path == currentPath, nameWidth, glyphs));
            }
        }

        return lines.Take(Math.Max(1, height)).Select(l => TextWidth.PadRight(SafeText.Fit(l, width, glyphs.Ellipsis), width)).ToImmutableArray();
    }

    private static string Item(LibraryItem item, bool selected, bool open, int nameWidth, Glyphs g)
    {
        string verdict = item.Verdict switch
        {
            LibraryVerdict.Pass => g.Met + " pass",
            LibraryVerdict.Fail => g.Violated + " FAIL",
            LibraryVerdict.Error => g.Violated + " ERROR",
        };
        string name = TextWidth.PadRight(SafeText.Fit(item.FileName, nameWidth, g.Ellipsis), nameWidth);
        string detail = item.Verdict == LibraryVerdict.Error
            ? SafeText.Visible(item.Problem ?? "could not be read")
            : SafeText.Visible(item.Title ?? string.Empty);
        string mark = selected ? g.Selected : " ";
        string openNote = open ? "  (open)" : string.Empty;
        return $"{mark} {TextWidth.PadRight(verdict, VerdictWidth + 2)} {name}  {detail}{openNote}";
    }
}
