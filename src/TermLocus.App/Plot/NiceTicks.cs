namespace TermLocus.App.Plot;

/// <summary>
/// Round numbers for axes: tick steps of 1, 2 or 5 × 10^k and the multiples of such a step inside a range, the
/// usual choice for graph labels ("nice numbers").
/// </summary>
public static class NiceTicks
{
    private static readonly double[] StepMantissas = [1.0, 2.0, 5.0, 10.0];

    // Finer than the tick steps so a fitted span wastes at most a fifth of the window.
    private static readonly double[] SpanMantissas = [1.0, 1.2, 1.5, 2.0, 2.5, 3.0, 4.0, 5.0, 6.0, 8.0, 10.0];

    /// <summary>The smallest step of the form 1, 2 or 5 × 10^k that divides <paramref name="span"/> (&gt; 0) into at
    /// most <paramref name="maxTicks"/> (≥ 1) intervals.</summary>
    public static double Step(double span, int maxTicks)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(maxTicks, 1);
        if (!(span > 0) || double.IsInfinity(span))
        {
            throw new ArgumentOutOfRangeException(nameof(span), span, "span must be positive and finite");
        }

        return RoundUp(span / maxTicks, StepMantissas);
    }

    /// <summary>The smallest number of the form m × 10^k, m in {1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8}, that is at least
    /// <paramref name="value"/> (&gt; 0): a round width for a view.</summary>
    public static double RoundSpanUp(double value)
    {
        if (!(value > 0) || double.IsInfinity(value))
        {
            throw new ArgumentOutOfRangeException(nameof(value), value, "value must be positive and finite");
        }

        return RoundUp(value, SpanMantissas);
    }

    /// <summary>Every multiple of <paramref name="step"/> in [<paramref name="min"/>, <paramref name="max"/>], ascending,
    /// snapped so that zero is exactly 0 and no multiple carries floating-point noise beyond the step's digits.</summary>
    public static IReadOnlyList<double> Multiples(double min, double max, double step)
    {
        if (!(step > 0) || double.IsInfinity(step))
        {
            throw new ArgumentOutOfRangeException(nameof(step), step, "step must be positive and finite");
        }

        var ticks = new List<double>();
        double first = Math.Ceiling((min / step) - Tolerance);
        double last = Math.Floor((max / step) + Tolerance);
        for (double k = first; k <= last && ticks.Count < MaxMultiples; k++)
        {
            ticks.Add(k == 0 ? 0.0 : k * step);
        }

        return ticks;
    }

    private const double Tolerance = 1e-9;

    private const int MaxMultiples = 10_000;

    private static double RoundUp(double value, double[] mantissas)
    {
        double power = Math.Pow(10, Math.Floor(Math.Log10(value)));
        foreach (double mantissa in mantissas)
        {
            // Allow a hair of rounding error so 0.3 / 3 still gives 0.1 and not 0.2.
            if (mantissa * power >= value * (1 - Tolerance))
            {
                return mantissa * power;
            }
        }

        return 10 * power;
    }
}
