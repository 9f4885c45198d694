using System.Globalization;

namespace TermLocus.App.Plot;

/// <summary>Short, culture-independent tick labels: "2", "0.5", "-10", "1e3", "2.5e-4".</summary>
public static class TickLabel
{
    /// <summary>At or above this size a label switches to an exponent, which is never longer than the digits.</summary>
    private const double LargeMagnitude = 1000;

    /// <summary>Steps finer than this switch to an exponent instead of many leading zeros.</summary>
    private const double SmallStep = 0.01;

    /// <summary>The label for tick <paramref name="value"/> on an axis whose ticks are <paramref name="step"/> apart
    /// (&gt; 0); the step decides how many digits are meaningful, so floating-point noise never shows.</summary>
    public static string Format(double value, double step)
    {
        if (!(step > 0) || double.IsInfinity(step))
        {
            throw new ArgumentOutOfRangeException(nameof(step), step, "step must be positive and finite");
        }

        double rounded = Math.Round(value / step) * step;
        if (rounded == 0 || !double.IsFinite(rounded))
        {
            return rounded == 0 ? "0" : rounded.ToString(CultureInfo.InvariantCulture);
        }

        int stepExponent = (int)Math.Floor(Math.Log10(step) + 1e-9);
        double magnitude = Math.Abs(rounded);
        if (magnitude >= LargeMagnitude || step < SmallStep)
        {
            int exponent = (int)Math.Floor(Math.Log10(magnitude) + 1e-9);
            double mantissa = rounded / Math.Pow(10, exponent);
            string digits = Fixed(mantissa, Math.Max(0, exponent - stepExponent));
            return digits + "e" + exponent.ToString(CultureInfo.InvariantCulture);
        }

        return Fixed(rounded, Math.Max(0, -stepExponent));
    }

    private static string Fixed(double value, int decimals)
    {
        string format = decimals == 0 ? "0" : "0." + new string('#', decimals);
        return value.ToString(format, CultureInfo.InvariantCulture);
    }
}
