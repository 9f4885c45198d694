namespace TermLocus.Core.Analysis;

/// <summary>
/// A truncated Laurent series Σ c_i·ε^(v+i) in an infinitesimal ε &gt; 0, for the ε method of the Routh array done
/// symbolically: entries stay separated by order, so a sign decided by an ε-order term is not drowned by rounding of
/// the 1/ε-order ones. Coefficients[0] is non-zero except for the zero series. Immutable.
/// </summary>
internal sealed class EpsilonSeries
{
    private EpsilonSeries(int valuation, double[] coefficients)
    {
        Valuation = valuation;
        Coefficients = coefficients;
    }

    /// <summary>The lowest power of ε present.</summary>
    public int Valuation { get; }

    /// <summary>Coefficients from ε^Valuation upwards, a fixed length per array.</summary>
    public double[] Coefficients { get; }

    /// <summary>True for the zero series.</summary>
    public bool IsZero => Coefficients[0] == 0.0;

    /// <summary>The sign as ε → 0+ (0 for the zero series).</summary>
    public int Sign => Math.Sign(Coefficients[0]);

    /// <summary>The leading coefficient (the size at the series' own order).</summary>
    public double Leading => Coefficients[0];

    /// <summary>A constant.</summary>
    public static EpsilonSeries Constant(double x, int length)
    {
        var c = new double[length];
        c[0] = x;
        return new EpsilonSeries(0, c);
    }

    /// <summary>sign·ε^power.</summary>
    public static EpsilonSeries Monomial(double sign, int power, int length)
    {
        var c = new double[length];
        c[0] = sign;
        return new EpsilonSeries(power, c);
    }

    /// <summary>This series times a real number.</summary>
    public EpsilonSeries Times(double k) => Normalized(Valuation, [.. Coefficients.Select(c => c * k)]);

    /// <summary>(a·b - c·d) / e, with a coefficient that cancels to within <paramref name="zeroTolerance"/> of the size of its two parts counted as zero.</summary>
    public static EpsilonSeries CrossDifferenceOver(
        EpsilonSeries a, EpsilonSeries b, EpsilonSeries c, EpsilonSeries d, EpsilonSeries e, double zeroTolerance)
    {
        var left = Multiply(a, b);
        var right = Multiply(c, d);
        return Divide(Subtract(left, right, zeroTolerance), e);
    }

    private static EpsilonSeries Multiply(EpsilonSeries a, EpsilonSeries b)
    {
        int k = a.Coefficients.Length;
        var c = new double[k];
        if (a.IsZero || b.IsZero)
        {
            return new EpsilonSeries(0, c);
        }

        for (int i = 0; i < k; i++)
        {
            for (int j = 0; j <= i; j++)
            {
                c[i] += a.Coefficients[j] * b.Coefficients[i - j];
            }
        }

        return new EpsilonSeries(a.Valuation + b.Valuation, c);
    }

    private static EpsilonSeries Subtract(EpsilonSeries a, EpsilonSeries b, double zeroTolerance)
    {
        int k = a.Coefficients.Length;
        if (b.IsZero)
        {
            return a;
        }

        if (a.IsZero)
        {
            return b.Times(-1.0);
        }

        int v = Math.Min(a.Valuation, b.Valuation);
        var c = new double[k];
        for (int i = 0; i < k; i++)
        {
            double x = At(a, v + i), y = At(b, v + i);
            double diff = x - y;
            c[i] = Math.Abs(diff) <= zeroTolerance * (Math.Abs(x) + Math.Abs(y)) ? 0.0 : diff;
        }

        return Normalized(v, c);
    }

    private static EpsilonSeries Divide(EpsilonSeries a, EpsilonSeries b)
    {
        int k = a.Coefficients.Length;
        var q = new double[k];
        if (a.IsZero)
        {
            return new EpsilonSeries(0, q);
        }

        for (int i = 0; i < k; i++)
        {
            double sum = a.Coefficients[i];
            for (int j = 1; j <= i; j++)
            {
                sum -= b.Coefficients[j] * q[i - j];
            }

            q[i] = sum / b.Coefficients[0];
        }

        return new EpsilonSeries(a.Valuation - b.Valuation, q);
    }

    /// <summary>The coefficient of ε^power (0 outside the stored window).</summary>
    private static double At(EpsilonSeries s, int power)
    {
        int i = power - s.Valuation;
        return i >= 0 && i < s.Coefficients.Length ? s.Coefficients[i] : 0.0;
    }

    private static EpsilonSeries Normalized(int valuation, double[] c)
    {
        int first = Array.FindIndex(c, x => x != 0.0);
        if (first <= 0)
        {
            return new EpsilonSeries(first < 0 ? 0 : valuation, c);
        }

        var shifted = new double[c.Length];
        Array.Copy(c, first, shifted, 0, c.Length - first);
        return new EpsilonSeries(valuation + first, shifted);
    }
}
