using System.Collections.Immutable;
using System.Text;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>
/// The pole table: one row per real pole or conjugate pair, least stable first, with ζ, ωn, σ, time to half (or to
/// double) and ωd; with a varied parameter also each pole's worst ζ and σ across its band and, given room, how far ζ
/// and σ move for +1 % of it (else a detail line for the selected pole says so). A row that misses a spec starts with
/// the violation glyph and names the problem in words, so it never depends on colour. Columns are dropped from the
/// right when the width is short. In a sampled loop the pole column is the root in z and the figures come from its
/// equivalent s = ln(z)/T.
/// </summary>
public static class PoleTablePresenter
{
    private const int MarkWidth = 3;
    private const int MinimumLocationWidth = 12;
    private const int NumberWidth = PoleFigureText.Width + 1;
    private const int MinimumSpecWidth = 10;

    private static readonly ImmutableArray<PoleColumn> PlainColumns =
        [PoleColumn.Damping, PoleColumn.NaturalFrequency, PoleColumn.DecayRate, PoleColumn.Time, PoleColumn.DampedFrequency];

    private static readonly ImmutableArray<PoleColumn> BandColumns =
    [
        PoleColumn.Damping, PoleColumn.WorstDamping, PoleColumn.NaturalFrequency, PoleColumn.DecayRate, PoleColumn.WorstDecayRate,
        PoleColumn.Time, PoleColumn.DampedFrequency, PoleColumn.DampingPerPercent, PoleColumn.DecayRatePerPercent,
    ];

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
        var rows = PoleRows.Group(poles.Poles, poles.Plane);
        int locationWidth = Math.Max(MinimumLocationWidth, rows.IsEmpty ? 0 : rows.Max(r => TextWidth.Of(SpecWording.Location(r.Pole, glyphs))) + 1);
        var columns = ColumnsFor(width, locationWidth, poles.BandFigures.IsEmpty ? PlainColumns : BandColumns);
        var lines = ImmutableArray.CreateBuilder<string>();
        lines.Add(Header(columns, locationWidth, poles.Plane.IsSampled, glyphs));
        if (rows.IsEmpty)
        {
            lines.Add("  no closed-loop poles (the characteristic polynomial is constant)");
            return Finish(lines, width, height, glyphs);
        }

        // The detail line says what the missing sensitivity columns would; it goes last, so it needs a line of its own.
        string? detail = columns.Contains(PoleColumn.DampingPerPercent) || poles.BandFigures.IsEmpty
            ? null
            : SensitivityLine(rows[Math.Clamp(selected ?? 0, 0, rows.Length - 1)], poles, glyphs);
        int room = Math.Max(1, height - 1 - (detail is null || height < 4 ? 0 : 1));
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

        if (detail is not null && height >= 4)
        {
            while (lines.Count < height - 1)
            {
                lines.Add(string.Empty);
            }

            lines.Add(detail);
        }

        return Finish(lines, width, height, glyphs);
    }

    /// <summary>
    /// "+1 % J moves -1.000 ± j1.000: ζ +0.00213, σ -0.0120 1/s", or why it cannot be said, for one row.
    /// </summary>
    internal static string SensitivityLine(PoleRow row, PoleSnapshot poles, Glyphs g)
    {
        string name = SafeText.Visible(poles.VariedParameter ?? "?");
        string at = SpecWording.Location(row.Pole, g);
        var band = poles.BandFiguresOf(row.Pole);
        if (band is { NearMultipleRoot: true })
        {
            return $"  +1 % {name} at {at}: undefined near a multiple root";
        }

        if (band?.DampingPerPercent is not double dz || band.DecayRatePerPercent is not double ds)
        {
            return $"  +1 % {name} at {at}: no figure (the pole has no finite equivalent, or {name} is 0)";
        }

        return $"  +1 % {name} moves {at}: {g.Zeta} {PoleFigureText.Signed(dz)}, {g.DecayRate} {PoleFigureText.Signed(ds)} 1/s";
    }

    /// <summary>The figure columns of <paramref name="order"/> that fit in <paramref name="width"/>, leaving room for the spec words.</summary>
    internal static ImmutableArray<PoleColumn> ColumnsFor(int width, int locationWidth, ImmutableArray<PoleColumn> order)
    {
        int used = MarkWidth + locationWidth + MinimumSpecWidth;
        var chosen = ImmutableArray.CreateBuilder<PoleColumn>();
        foreach (var column in order)
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

    private static string Header(ImmutableArray<PoleColumn> columns, int locationWidth, bool sampled, Glyphs g)
    {
        var sb = new StringBuilder(new string(' ', MarkWidth));
        sb.Append(TextWidth.PadRight(sampled ? "pole in z" : "pole", locationWidth));
        foreach (var column in columns)
        {
            sb.Append(TextWidth.PadLeft(PoleFigureText.Title(column, g), NumberWidth - 1)).Append(' ');
        }

        return sb.Append(" spec").ToString();
    }

    private static string Row(PoleRow row, PoleSnapshot poles, ImmutableArray<PoleColumn> columns, int locationWidth, bool isSelected, Glyphs g)
    {
        var problems = Problems(row, poles, g);
        var band = poles.BandFiguresOf(row.Pole);
        var sb = new StringBuilder();
        sb.Append(isSelected ? g.Selected : " ");
        sb.Append(problems.Count > 0 ? g.Violated : " ").Append(' ');
        sb.Append(TextWidth.PadRight(SpecWording.Location(row.Pole, g), locationWidth));
        foreach (var column in columns)
        {
            sb.Append(TextWidth.PadLeft(PoleFigureText.Figure(row, band, column, g), NumberWidth - 1)).Append(' ');
        }

        sb.Append(' ').Append(problems.Count > 0 ? string.Join(", ", problems) : g.Met);
        return sb.ToString();
    }

    private static List<string> Problems(PoleRow row, PoleSnapshot poles, Glyphs g)
    {
        var words = new List<string>();
        if (!row.IsStable)
        {
            // A pole on the boundary neither decays nor grows: marginal, not unstable (the status line says more).
            words.Add(row.OnBoundary ? "marginal" : "unstable");
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

    private static ImmutableArray<string> Finish(ImmutableArray<string>.Builder lines, int width, int height, Glyphs glyphs) =>
        lines.Take(Math.Max(1, height)).Select(l => TextWidth.PadRight(SafeText.Fit(l, width, glyphs.Ellipsis), width)).ToImmutableArray();
}
