namespace TermLocus.Core.Analysis;

/// <summary>The maximum of a function on an interval: the best of a uniform sample, refined by golden-section search.</summary>
internal static class DesignOptimum
{
    /// <summary>The golden-section search stops when its bracket is below this share of the scale.</summary>
    private const double StopShare = 1e-10;

    private const int MaxIterations = 200;

    private static readonly double InverseGolden = (Math.Sqrt(5.0) - 1.0) / 2.0;

    /// <summary>Samples within this share of the best value (or of 1, when smaller) count as equally good.</summary>
    private const double PlateauShare = 1e-9;

    /// <summary>
    /// The argument in [<paramref name="a"/>, <paramref name="b"/>] with the largest <paramref name="f"/> found:
    /// <paramref name="samples"/> (&gt;= 3) uniform samples, then golden-section search between the neighbours of
    /// the best one. Finds the global maximum when f is unimodal between those neighbours; a search, not a proof.
    /// When several neighbouring samples are equally best (a plateau: e.g. ζ = 1 for every overdamped value), the
    /// middle of that run is returned, as far as the samples tell from both of its ends.
    /// </summary>
    public static double Maximize(Func<double, double> f, double a, double b, int samples, double scale)
    {
        if (!(b > a))
        {
            return a;
        }

        var xs = new double[samples];
        var fs = new double[samples];
        for (int i = 0; i < samples; i++)
        {
            xs[i] = i == samples - 1 ? b : a + ((b - a) * i / (samples - 1));
            fs[i] = f(xs[i]);
        }

        int k = Array.IndexOf(fs, fs.Max());
        double level = fs[k] - (PlateauShare * Math.Max(1.0, Math.Abs(fs[k])));
        int first = k, last = k;
        while (first > 0 && fs[first - 1] >= level)
        {
            first--;
        }

        while (last < samples - 1 && fs[last + 1] >= level)
        {
            last++;
        }

        if (last > first)
        {
            return xs[first] + ((xs[last] - xs[first]) / 2.0);
        }

        var (x, fx) = Golden(f, xs[Math.Max(k - 1, 0)], xs[Math.Min(k + 1, samples - 1)], StopShare * scale);
        return fx > fs[k] ? x : xs[k];
    }

    private static (double X, double F) Golden(Func<double, double> f, double a, double b, double tolerance)
    {
        double c = b - (InverseGolden * (b - a)), d = a + (InverseGolden * (b - a));
        double fc = f(c), fd = f(d);
        for (int i = 0; i < MaxIterations && b - a > tolerance; i++)
        {
            if (fc >= fd)
            {
                (b, d, fd) = (d, c, fc);
                c = b - (InverseGolden * (b - a));
                fc = f(c);
            }
            else
            {
                (a, c, fc) = (c, d, fd);
                d = a + (InverseGolden * (b - a));
                fd = f(d);
            }
        }

        return fc >= fd ? (c, fc) : (d, fd);
    }
}
