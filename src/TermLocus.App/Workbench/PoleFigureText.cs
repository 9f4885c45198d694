using System.Globalization;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

#pragma warning disable CS8524 // every named value is handled; see Update.

/// <summary>The pole table's column titles and figures, each fitting a column of <see cref="Width"/> characters.</summary>
internal static class PoleFigureText
{
    /// <summary>Characters of a figure column (titles and figures are right-aligned in it).</summary>
    public const int Width = 8;

    /// <summary>A column's title, at most <see cref="Width"/> characters.</summary>
    public static string Title(PoleColumn column, Glyphs g)
    {
        bool ascii = g == Glyphs.Ascii;
        string title = column switch
        {
            PoleColumn.Damping => g.Zeta,
            PoleColumn.WorstDamping => ascii ? "zeta bnd" : g.Zeta + " band",
            PoleColumn.NaturalFrequency => g.NaturalFrequency + " rad/s",
            PoleColumn.DecayRate => g.DecayRate + " 1/s",
            PoleColumn.WorstDecayRate => ascii ? "sig band" : g.DecayRate + " band",
            PoleColumn.Time => g.TimeToHalf + " s",
            PoleColumn.DampedFrequency => g.DampedFrequency + " rad/s",
            PoleColumn.DampingPerPercent => ascii ? "dzeta/1%" : "Δ" + g.Zeta + "/+1%",
            PoleColumn.DecayRatePerPercent => ascii ? "dsig/1%" : "Δ" + g.DecayRate + "/+1%",
        };

        // A title too long for its column loses its unit rather than being cut mid-word.
        return TextWidth.Of(title) <= Width || !title.Contains(' ', StringComparison.Ordinal)
            ? title
            : title[..title.IndexOf(' ', StringComparison.Ordinal)];
    }

    /// <summary>The figure of <paramref name="row"/> in <paramref name="column"/>, with fewer digits rather than cut.</summary>
    public static string Figure(PoleRow row, PoleBandFigures? band, PoleColumn column, Glyphs g)
    {
        for (int digits = 4; digits > 2; digits--)
        {
            string text = Figure(row, band, column, digits, g);
            if (TextWidth.Of(text) <= Width)
            {
                return text;
            }
        }

        return Figure(row, band, column, 2, g);
    }

    /// <summary>A signed change with three significant digits: "+0.00213", "-1.20", "0".</summary>
    public static string Signed(double value, int digits = 3)
    {
        string text = NumberText.Significant(value, digits);
        return value > 0 ? "+" + text : text;
    }

    /// <summary>A damping ratio as the table prints it: four decimals.</summary>
    public static string Damping(double zeta) => zeta.ToString("F4", CultureInfo.InvariantCulture);

    private static string Figure(PoleRow row, PoleBandFigures? band, PoleColumn column, int digits, Glyphs g)
    {
        if (row.Metrics is not { } m)
        {
            // A deadbeat root z = 0 has no finite equivalent s: it is gone after one sample.
            return column == PoleColumn.Damping ? "deadbeat" : "-";
        }

        return column switch
        {
            PoleColumn.Damping => m.Damping is double z ? Damping(z) : "-",
            PoleColumn.WorstDamping => band?.WorstDamping is double w ? Damping(w) : "-",
            PoleColumn.NaturalFrequency => NumberText.Significant(m.NaturalFrequency, digits),
            PoleColumn.DecayRate => NumberText.Significant(m.DecayRate, digits),
            PoleColumn.WorstDecayRate => band?.WorstDecayRate is double w ? NumberText.Significant(w, digits) : "-",
            PoleColumn.Time => m.TimeToHalfSeconds is double half ? NumberText.Significant(half, digits)
                : m.TimeToDoubleSeconds is double twice ? g.TimeToDouble + " " + NumberText.Significant(twice, digits) : "-",
            PoleColumn.DampedFrequency => m.DampedFrequency != 0 ? NumberText.Significant(m.DampedFrequency, digits) : "0",
            PoleColumn.DampingPerPercent => PerPercent(band, band?.DampingPerPercent, digits - 1),
            PoleColumn.DecayRatePerPercent => PerPercent(band, band?.DecayRatePerPercent, digits - 1),
        };
    }

    private static string PerPercent(PoleBandFigures? band, double? value, int digits) =>
        band is { NearMultipleRoot: true } ? "undef" : value is double v ? Signed(v, digits) : "-";
}
