namespace TermLocus.App.Workbench;

/// <summary>
/// Step sizes on the 1-2-5 series (…, 0.1, 0.2, 0.5, 1, 2, 5, …) and stepping on a grid of the step, so that
/// stepping 0.8 up by 0.2 gives 1 and not 1.0000000000000002.
/// </summary>
public static class StepSeries
{
    /// <summary>Steps across a range when the plant is opened.</summary>
    public const double StepsPerRange = 100.0;

    /// <summary>The finest step allowed, as a fraction of the range width.</summary>
    public const double FinestFraction = 1e-7;

    /// <summary>The coarsest step allowed, as a fraction of the range width.</summary>
    public const double CoarsestFraction = 0.5;

    private const double GridTolerance = 1e-9;

    /// <summary>The 1-2-5 step nearest to (at most) a hundredth of the range width; 1 for a degenerate range.</summary>
    public static double Initial(double rangeWidth) =>
        rangeWidth > 0 && double.IsFinite(rangeWidth) ? AtOrBelow(rangeWidth / StepsPerRange) : 1.0;

    /// <summary>The largest 1-2-5 value not above <paramref name="x"/> (x &gt; 0).</summary>
    public static double AtOrBelow(double x)
    {
        int exponent = (int)Math.Floor(Math.Log10(x) + GridTolerance);
        double decade = Math.Pow(10, exponent);
        double mantissa = x / decade;
        double nice = mantissa >= 5 - GridTolerance ? 5 : mantissa >= 2 - GridTolerance ? 2 : 1;
        return Clean(nice * decade);
    }

    /// <summary>One notch finer, but not below <see cref="FinestFraction"/> of the range width.</summary>
    public static double Finer(double step, double rangeWidth)
    {
        double finer = AtOrBelow(step * (1 - 1e-6));
        return finer < rangeWidth * FinestFraction ? step : finer;
    }

    /// <summary>One notch coarser, but not above <see cref="CoarsestFraction"/> of the range width.</summary>
    public static double Coarser(double step, double rangeWidth)
    {
        double mantissa = step / Math.Pow(10, Math.Floor(Math.Log10(step) + GridTolerance));
        double factor = mantissa < 1.5 ? 2 : mantissa < 3.5 ? 2.5 : 2;
        double coarser = Clean(step * factor);
        return coarser > rangeWidth * CoarsestFraction ? step : coarser;
    }

    /// <summary>The next grid point of <paramref name="step"/> above (direction +1) or below (-1) the value.</summary>
    public static double Next(double value, double step, int direction)
    {
        double units = value / step;
        double n = direction > 0 ? Math.Floor(units + GridTolerance) + 1 : Math.Ceiling(units - GridTolerance) - 1;
        return Round(n * step, step);
    }

    /// <summary><paramref name="value"/> rounded to the decimals of <paramref name="step"/>, removing binary dust.</summary>
    public static double Round(double value, double step)
    {
        int decimals = Math.Clamp((int)-Math.Floor(Math.Log10(step) + GridTolerance) + 1, 0, 15);
        return Math.Round(value, decimals);
    }

    private static double Clean(double x) => double.Parse(x.ToString("G6", System.Globalization.CultureInfo.InvariantCulture), System.Globalization.CultureInfo.InvariantCulture);
}
