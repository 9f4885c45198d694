using TermLocus.App.Reports;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>The one-line verdict written with a saved operating point: the band-wide check's, in ASCII.</summary>
public static class SaveVerdict
{
    private const string Prefix = "verdict: ";

    /// <summary>
    /// <see cref="CheckReportPresenter.Verdict"/> without its "verdict: " prefix, in ASCII symbols (a plant file is
    /// read in editors and terminals of every kind); why the check could not run when it could not.
    /// </summary>
    public static string Of(BandCheck check) => Of(check, Glyphs.Ascii);

    /// <summary>As <see cref="Of(BandCheck)"/> in the symbols <paramref name="glyphs"/> (for the screen).</summary>
    public static string Of(BandCheck check, Glyphs glyphs)
    {
        ArgumentNullException.ThrowIfNull(check);
        if (check.Result is not { } result)
        {
            return "band not checked: " + SafeText.Visible(check.Problem ?? "unknown");
        }

        string text = CheckReportPresenter.Verdict(result, glyphs);
        return text.StartsWith(Prefix, StringComparison.Ordinal) ? text[Prefix.Length..] : text;
    }
}
