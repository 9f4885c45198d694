using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

/// <summary>
/// Words for a miss of <c>max_overshoot_pct</c>. That limit is judged on the simulated closed-loop step response, not
/// on a pole, so the miss names the figure and the limit in percent and never a pole location.
/// </summary>
public static class OvershootWording
{
    /// <summary>The plant-file key of the overshoot limit.</summary>
    public const string Key = "max_overshoot_pct";

    /// <summary>True when <paramref name="specKey"/> is the overshoot limit.</summary>
    public static bool Judges(string specKey) => string.Equals(specKey, Key, StringComparison.Ordinal);

    /// <summary>
    /// <c>max_overshoot_pct: step response overshoot 26.12 % &gt; 25 %</c>; when there is no figure (the response
    /// does not settle) <c>max_overshoot_pct 25 %: the step response does not settle</c>.
    /// </summary>
    public static string Violation(SpecMiss miss)
    {
        ArgumentNullException.ThrowIfNull(miss);
        string limit = NumberText.Exact(miss.Limit);
        if (miss.Actual is not double actual)
        {
            return $"{Key} {limit} %: the step response does not settle";
        }

        // On the limit the figure rounds to it; show the digits that make "25.00 % > 25 %" honest.
        string figure = NumberText.Significant(actual);
        if (figure == NumberText.Significant(miss.Limit))
        {
            figure = NumberText.Short(actual, 12);
        }

        return $"{Key}: step response overshoot {figure} % > {limit} %";
    }
}
