using System.Numerics;
using TermLocus.App.Text;

namespace TermLocus.App.Workbench;

// Switches over our enums list every named value and have no default arm, so a new value breaks the build (CS8509);
// values outside the enum (CS8524) cannot occur.
#pragma warning disable CS8524

/// <summary>The words and symbols for specs, shared by the pole table, the status line and saved verdicts.</summary>
public static class SpecWording
{
    /// <summary>"ζ 0.4200 < min 0.6" style comparison: the figure's symbol and the relation to the limit.</summary>
    public static string Figure(string specKey, Glyphs g) => specKey switch
    {
        "min_damping" => g.Zeta,
        "min_decay_rate" => g.DecayRate,
        "max_time_to_half" => g.TimeToHalf,
        "max_settling_time" => "settling time",
        "min_natural_frequency" or "max_natural_frequency" => g.NaturalFrequency,
        "max_overshoot_pct" => "overshoot %",
        _ => SafeText.Visible(specKey),
    };

    /// <summary>A short word for the pole table's spec column: what is wrong with the pole.</summary>
    public static string Problem(string specKey, Glyphs g) => specKey switch
    {
        "min_damping" => g.Zeta + " low",
        "min_decay_rate" or "max_time_to_half" or "max_settling_time" => "slow",
        "min_natural_frequency" => g.NaturalFrequency + " low",
        "max_natural_frequency" => g.NaturalFrequency + " high",
        "max_overshoot_pct" => "overshoot",
        _ => SafeText.Visible(specKey),
    };

    /// <summary>True for limits that are a minimum (the figure must not fall below the limit).</summary>
    public static bool IsMinimum(string specKey) => specKey.StartsWith("min_", StringComparison.Ordinal);

    /// <summary>
    /// The violation in words and numbers: which spec, actual against limit, which pole, e.g.
    /// <c>min_damping: ζ 0.4200 &lt; 0.6 at -1.200 ± j2.600</c>.
    /// </summary>
    public static string Violation(SpecMiss miss, Glyphs g)
    {
        if (OvershootWording.Judges(miss.SpecKey))
        {
            return OvershootWording.Violation(miss);
        }

        string key = SafeText.Visible(miss.SpecKey);
        string at = Location(miss.Pole, g);
        if (miss.Actual is not double actual)
        {
            // Time limits on a pole that does not decay, damping of a pole at the origin.
            return $"{key} {NumberText.Exact(miss.Limit)}: the pole at {at} does not decay";
        }

        string relation = IsMinimum(miss.SpecKey) ? "<" : ">";
        // On a boundary the figure rounds to the limit; the digits that make "0.3000 < 0.3" honest are added.
        string figure = NumberText.Against(actual, miss.Limit);

        return $"{key}: {Figure(miss.SpecKey, g)} {figure} {relation} {NumberText.Exact(miss.Limit)} at {at}";
    }

    /// <summary>A pole's place in the s-plane: <c>-12.40</c> for a real pole, <c>-3.100 ± j3.900</c> for a pair.</summary>
    public static string Location(Complex pole, Glyphs g)
    {
        double scale = Math.Max(1.0, Complex.Abs(pole));
        if (Math.Abs(pole.Imaginary) <= PoleRows.RealTolerance * scale)
        {
            return NumberText.Significant(pole.Real);
        }

        return $"{NumberText.Significant(pole.Real)} {g.PlusMinus} {g.Imaginary}{NumberText.Significant(Math.Abs(pole.Imaginary))}";
    }

    /// <summary>What happens at a marked swept value, in words.</summary>
    public static string DescribeMark(SweepMark mark) => mark.Kind switch
    {
        SweepMarkKind.SpecBoundary => $"{SafeText.Visible(mark.SpecKey ?? "spec")} boundary",
        SweepMarkKind.StabilityCrossing => "stability crossing (a pole on the imaginary axis)",
        SweepMarkKind.BreakPoint => "break point on the real axis",
    };

    /// <summary>One line for a saved operating point or the quit question: all met, or the worst miss.</summary>
    public static string Verdict(PoleSnapshot poles, Glyphs g)
    {
        if (poles.AllMet)
        {
            return "meets every spec at the nominal values";
        }

        int more = poles.Misses.Length - 1;
        string tail = more > 0 ? $" (and {more} more)" : string.Empty;
        return "misses " + Violation(poles.Misses[0], g) + tail;
    }
}
