using System.Globalization;
using TermLocus.App.Text;
using TermLocus.Core.Analysis;

namespace TermLocus.App.Reports;

/// <summary>Words for points of a tolerance box, e.g. <c>J +20 %, B -25 %</c>, shared by reports and the workbench.</summary>
public static class BandWording
{
    /// <summary>
    /// Where in the box a point lies: each toleranced parameter's offset from nominal in percent (or its value when
    /// the nominal is 0); "nominal" when the box has no axes.
    /// </summary>
    public static string Point(ToleranceBox box, IReadOnlyDictionary<string, double> at)
    {
        if (box.Axes.IsEmpty)
        {
            return "nominal";
        }

        var parts = new List<string>();
        foreach (var axis in box.Axes)
        {
            if (!at.TryGetValue(axis.Name, out double value))
            {
                continue;
            }

            string name = SafeText.Visible(axis.Name);
            parts.Add(axis.PercentFromNominal(value) is double pct
                ? $"{name} {Signed(pct)} %"
                : $"{name}={NumberText.Short(value, 6)}");
        }

        return string.Join(", ", parts);
    }

    /// <summary>The box itself: each axis with its band, e.g. <c>J 0.03..0.05</c>.</summary>
    public static string Box(ToleranceBox box) =>
        box.Axes.IsEmpty
            ? "no toleranced parameters"
            : string.Join(", ", box.Axes.Select(a =>
                $"{SafeText.Visible(a.Name)} {NumberText.Short(a.Band.Low, 6)}..{NumberText.Short(a.Band.High, 6)}"));

    private static string Signed(double pct)
    {
        double rounded = Math.Round(pct, 1);
        if (rounded == 0)
        {
            return "0";
        }

        string text = rounded.ToString("0.#", CultureInfo.InvariantCulture);
        return rounded > 0 ? "+" + text : text;
    }
}
