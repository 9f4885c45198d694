using System.Collections.Immutable;
using System.Text;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

#pragma warning disable CS8524 // every named value is handled; see Update.

/// <summary>
/// The pole table: one row per real pole or conjugate pair, rightmost (least stable) first, with ζ, ωn, σ, time to
/// half (or to double) and ωd. A row that misses a spec starts with the violation glyph and names the problem in
/// words, so it never depends on colour. Columns are dropped from the right when the width is short.
/// </summary>
public static class PoleTablePresenter
{
    private const int MarkWidth = 3;
    private const int MinimumLocationWidth = 12;
    private const int NumberWidth = 9;
    private const int MinimumSpecWidth = 10;

    /// <summary>
    /// At most <paramref name="height"/> lines of exactly <paramref name="width"/> columns: a header, then rows,
    /// scrolled so <paramref name="selected"/> is visible, with a "more" line when rows are left out.
    /// </summary>
    /// <param name="poles">The poles and the specs they miss.</param>
    /// <param name="selected">The selected row to mark, or null when the table does not have focus.</param>
    /// <param name="width">Columns available, &gt;= 1.</param>
    /// <param name="height">Lines available, &gt;= 1.</param>
    /// <param name="glyphs">Symbols to use.</param>
    public static ImmutableArray<string> Lines(PoleSnapshot poles, int? selected, int width, int height, Glyphs glyphs)
    {
        var rows = PoleRows.Group(poles.Poles);
        int locationWidth = Math.Max(MinimumLocationWidth, rows.IsEmpty ? 0 : rows.Max(r => TextWidth.Of(SpecWording.Location(r.Pole, glyphs))) + 1);
        var columns = ColumnsFor(width, locationWidth);
        var lines = ImmutableArray.CreateBuilder<string>();
        lines.Add(Header(columns, locationWidth, glyphs));
        if (rows.IsEmpty)
        {
            lines.Add("  no closed-loop poles (the characteristic polynomial is constant)");
            return Finish(lines, width, height, glyphs);
        }

        int room = Math.Max(1, height - 1);
        bool fits = rows.Length <= room;
        int visible = fits ? rows.Length : Math.Max(1, room - 1);
        int first = fits ? 0 : Math.Clamp((selected ?? 0) - visible + 1, 0, rows.Length - visible);
        for (int i = first; i < first + visible; i++)
        {
            lines.Add(Row(rows[i], poles, columns, locationWidth, i == selected, glyphs));
        }

        if (!fits)
        {
            lines.Add($"  {rows.Length - visible} more (Tab, then {glyphs.Up}/{glyphs.Down})");
        }

        return Finish(lines, width, height, glyphs);
    }

    /// <summary>The figure columns that fit in <paramref name="width"/>, in order, leaving room for the spec words.</summary>
    internal static ImmutableArray<PoleColumn> ColumnsFor(int width, int locationWidth)
    {
        PoleColumn[] all = [PoleColumn.Damping, PoleColumn.NaturalFrequency, PoleColumn.DecayRate, PoleColumn.Time, PoleColumn.DampedFrequency];
        int used = MarkWidth + locationWidth + MinimumSpecWidth;
        var chosen = ImmutableArray.CreateBuilder<PoleColumn>();
        foreach (var column in all)
        {
            if (used + NumberWidth > width && chosen.Count > 0)
            {
                break;
            }

            chosen.Add(column);
            used += NumberWidth;
        }

        return chosen.ToImmutable();
    }

    private static string Header(ImmutableArray<PoleColumn> columns, int locationWidth, Glyphs g)
    {
        var sb = new StringBuilder(new string(' ', MarkWidth));
        sb.Append(TextWidth.PadRight("pole", locationWidth));
        foreach (var column in columns)
        {
            string title = column switch
            {
                PoleColumn.Damping => g.Zeta,
                PoleColumn.NaturalFrequency => g.NaturalFrequency + " rad/s",
                PoleColumn.DecayRate => g.DecayRate + " 1/s",
                PoleColumn.Time => g.TimeToHalf + " s",
                PoleColumn.DampedFrequency => g.DampedFrequency + " rad/s",
            };
            sb.Append(TextWidth.PadLeft(Shorten(title), NumberWidth - 1)).Append(' ');
        }

        return sb.Append(" spec").ToString();
    }

    // A title too long for its column loses its unit rather than being cut mid-word.
    private static string Shorten(string title) =>
        TextWidth.Of(title) <= NumberWidth - 1 || !title.Contains(' ', StringComparison.Ordinal)
            ? title
            : title[..title.IndexOf(' ', StringComparison.Ordinal)];

    private static string Row(PoleRow row, PoleSnapshot poles, ImmutableArray<PoleColumn> columns, int locationWidth, bool isSelected, Glyphs g)
    {
        var problems = Problems(row, poles, g);
        var sb = new StringBuilder();
        sb.Append(isSelected ? g.Selected : " ");
        sb.Append(problems.Count > 0 ? g.Violated : " ").Append(' ');
        sb.Append(TextWidth.PadRight(SpecWording.Location(row.Pole, g), locationWidth));
        foreach (var column in columns)
        {
            sb.Append(TextWidth.PadLeft(Fitting(digits => Figure(row, column, digits, g)), NumberWidth - 1)).Append(' ');
        }

        sb.Append(' ').Append(problems.Count > 0 ? string.Join(", ", problems) : g.Met);
        return sb.ToString();
    }

    private static List<string> Problems(PoleRow row, PoleSnapshot poles, Glyphs g)
    {
        var words = new List<string>();
        if (row.Pole.Real > 0)
        {
            words.Add("unstable");
        }

        foreach (var miss in poles.MissesOf(row.Pole))
        {
            string word = SpecWording.Problem(miss.SpecKey, g);
            if (!words.Contains(word))
            {
                words.Add(word);
            }
        }

        return words;
    }

    // Fewer significant digits rather than a cut-off number.
    private static string Fitting(Func<int, string> figure)
    {
        for (int digits = 4; digits > 2; digits--)
        {
            string text = figure(digits);
            if (TextWidth.Of(text) <= NumberWidth - 1)
            {
                return text;
            }
        }

        return figure(2);
    }

    private static string Figure(PoleRow row, PoleColumn column, int digits, Glyphs g)
    {
        var m = row.Metrics;
        return column switch
        {
            PoleColumn.Damping => m.Damping is double z ? z.ToString("F4", System.Globalization.CultureInfo.InvariantCulture) : "-",
            PoleColumn.NaturalFrequency => NumberText.Significant(m.NaturalFrequency, digits),
            PoleColumn.DecayRate => NumberText.Significant(m.DecayRate, digits),
            PoleColumn.Time => m.TimeToHalfSeconds is double half ? NumberText.Significant(half, digits)
                : m.TimeToDoubleSeconds is double twice ? g.TimeToDouble + " " + NumberText.Significant(twice, digits) : "-",
            PoleColumn.DampedFrequency => row.IsPair ? NumberText.Significant(m.DampedFrequency, digits) : "0",
        };
    }

    private static ImmutableArray<string> Finish(ImmutableArray<string>.Builder lines, int width, int height, Glyphs glyphs) =>
        lines.Take(Math.Max(1, height)).Select(l => TextWidth.PadRight(SafeText.Fit(l, width, glyphs.Ellipsis), width)).ToImmutableArray();
}
