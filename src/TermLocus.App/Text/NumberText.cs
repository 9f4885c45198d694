using System.Globalization;

namespace TermLocus.App.Text;

/// <summary>
/// Fixed, invariant-culture number spellings shared by every presenter, so the same figure always reads the same.
/// </summary>
public static class NumberText
{
    /// <summary>Magnitudes from here up are printed in exponent form.</summary>
    public const double LargeMagnitude = 1e5;

    /// <summary>Non-zero magnitudes below this are printed in exponent form.</summary>
    public const double SmallMagnitude = 1e-3;

    /// <summary>
    /// <paramref name="value"/> with <paramref name="digits"/> significant digits in fixed notation (e.g. 3.100,
    /// 12.40, 0.2236, 4982), or exponent notation (1.235e+05, 4.700e-06) outside [1e-3, 1e5). Zero prints as 0;
    /// NaN as "nan", infinities as "inf" and "-inf"; never "-0".
    /// </summary>
    public static string Significant(double value, int digits = 4)
    {
        if (double.IsNaN(value))
        {
            return "nan";
        }

        if (double.IsInfinity(value))
        {
            return value > 0 ? "inf" : "-inf";
        }

        if (value == 0.0)
        {
            return "0";
        }

        double magnitude = Math.Abs(value);
        if (magnitude >= LargeMagnitude || magnitude < SmallMagnitude)
        {
            string mantissa = new string('0', Math.Max(0, digits - 1));
            return value.ToString($"0.{mantissa}e+00", CultureInfo.InvariantCulture);
        }

        int exponent = (int)Math.Floor(Math.Log10(magnitude));
        int decimals = Math.Clamp(digits - 1 - exponent, 0, 12);
        if (Math.Round(magnitude, decimals) >= Math.Pow(10, exponent + 1) && decimals > 0)
        {
            decimals--;
        }

        return StripNegativeZero(value.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture));
    }

    /// <summary>
    /// The shortest spelling that reads back as the same double (for values the user chose, such as a swept value
    /// of 0.35), in invariant culture, with a lower-case exponent like every other spelling here (1e-09, 2.5e+20).
    /// </summary>
    public static string Exact(double value) =>
        StripNegativeZero(value.ToString("R", CultureInfo.InvariantCulture).Replace('E', 'e'));

    /// <summary>
    /// <paramref name="value"/> rounded to <paramref name="digits"/> significant digits and spelt as briefly as it
    /// reads back (12, 2.414214, 4.7e-06), for solved values where the trailing digits are noise.
    /// </summary>
    public static string Short(double value, int digits = 7)
    {
        if (value == 0.0 || !double.IsFinite(value))
        {
            return Exact(value);
        }

        string rounded = value.ToString("G" + digits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        return Exact(double.Parse(rounded, NumberStyles.Float, CultureInfo.InvariantCulture));
    }

    /// <summary>
    /// <paramref name="value"/> as <see cref="Significant"/> spells it, with digits added (up to the value itself) until
    /// the text reads on the same side of <paramref name="limit"/> as the value does, so a figure never prints equal to
    /// (or on the wrong side of) the limit it is compared with: "0.1200" against 0.12 becomes "0.1200003".
    /// </summary>
    public static string Against(double value, double limit, int digits = 4)
    {
        string text = Significant(value, digits);
        if (!double.IsFinite(value) || !double.IsFinite(limit) || value == limit)
        {
            return text;
        }

        for (int more = digits + 1; Math.Sign(Read(text) - limit) != Math.Sign(value - limit) && more <= 17; more++)
        {
            text = Short(value, more);
        }

        return text;
    }

    /// <summary>
    /// The swept value to stand on near a computed one (a spec boundary, a crossing, a point picked on the plane): the
    /// shortest number at <paramref name="digits"/> significant digits, with more while that is further than a tenth of
    /// <paramref name="step"/> from <paramref name="value"/>, so the value shown is the value used and saved, and it
    /// stays apart from the neighbouring steps. Non-finite values come back unchanged.
    /// </summary>
    public static double Tidy(double value, double step, int digits = 7)
    {
        if (!double.IsFinite(value) || value == 0.0)
        {
            return value;
        }

        for (int d = digits; d < 17; d++)
        {
            double rounded = Read(Short(value, d));
            if (Math.Abs(rounded - value) <= Math.Abs(step) / 10.0)
            {
                return rounded;
            }
        }

        return value;
    }

    /// <summary>Parses a number typed by a user (invariant culture, exponent allowed); false for anything else.</summary>
    public static bool TryParse(string text, out double value) =>
        double.TryParse(text.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out value) && double.IsFinite(value);

    private static double Read(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);

    private static string StripNegativeZero(string text)
    {
        if (text.Length > 1 && text[0] == '-' && text.AsSpan(1).IndexOfAnyExcept("0.") < 0)
        {
            return text[1..];
        }

        return text;
    }
}
