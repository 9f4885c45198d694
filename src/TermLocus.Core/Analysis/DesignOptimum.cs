namespace TermLocus.Core.Analysis;

/// <summary>The maximum of a function on an interval: the best of a sample, refined by golden-section search.</summary>
internal static class DesignOptimum
{
    /// <summary>The golden-section search stops when its bracket is below this share of the scale.</summary>
    public const double StopShare = 1e-10;

    private const int MaxIterations = 200;

    private static readonly double InverseGolden = (Math.Sqrt(5.0) - 1.0) / 2.0;

    /// <summary>Samples within this share of the best value (or of 1, when smaller) count as equally good.</summary>
    private const double PlateauShare = 1e-9;

    /// <summary>
    /// The argument in [<paramref name="a"/>, <paramref name="b"/>] with the largest <paramref name="f"/> found:
    /// <paramref name="samples"/> (&gt;= 3) uniform samples, then golden-section search between the neighbours of
    /// the best one to <see cref="StopShare"/> of <paramref name="scale"/>. Finds the global maximum when f is unimodal
    /// between those neighbours; a search, not a proof. When several neighbouring samples are equally best (a plateau:
    /// e.g. ζ = 1 for every overdamped value), the middle of that run is returned, as far as the samples tell from both
    /// of its ends.
    /// </summary>
    public static double Maximize(Func<double, double> f, double a, double b, int samples, double scale) =>
        MaximizeOrPlateau(f, a, b, samples, scale).X;

    /// <summary>
    /// As <see cref="Maximize(Func{double, double}, double, double, int, double)"/>, with the value there, or null
    /// when the result is the middle of a plateau (not valued; then it is one of many equally good arguments).
    /// </summary>
    public static (double X, double? Value) MaximizeOrPlateau(Func<double, double> f, double a, double b, int samples, double scale)
    {
        if (!(b > a))
        {
            return (a, f(a));
        }

        var xs = new double[samples];
        var fs = new double[samples];
        for (int i = 0; i < samples; i++)
        {
            xs[i] = i == samples - 1 ? b : a + ((b - a) * i / (samples - 1));
            fs[i] = f(xs[i]);
        }

        return Refine((x, _) => f(x), xs, fs, StopShare * scale);
    }

    /// <summary>
    /// As the uniform overload, over the samples <paramref name="xs"/> (ascending, distinct, at least 2) and to
    /// <paramref name="stopShare"/> of <paramref name="scale"/>, for a function dear to evaluate:
    /// <paramref name="value"/>(x, floor) must be exact when it is at least floor and may be any value below floor
    /// otherwise (so it can stop early), and <paramref name="bound"/>(x) &gt;= value(x, ·) must be cheap. Samples are
    /// valued in decreasing order of their bounds, each against the best so far, and those whose bound cannot reach it
    /// are not valued at all; each golden-section point is valued against the point it competes with. A plateau (the
    /// best value held over a stretch: no overshoot, say) is not judged from the samples alone: its ends are solved by
    /// bisection from the best point found to the nearest samples below it, and the middle returned.
    /// </summary>
    public static double Maximize(
        Func<double, double> bound, Func<double, double, double> value, IReadOnlyList<double> xs, double scale, double stopShare)
    {
        var x = xs.ToArray();
        if (x.Length < 2)
        {
            return x[0];
        }

        var bounds = x.Select(bound).ToArray();
        var fs = (double[])bounds.Clone();
        double best = double.NegativeInfinity;
        foreach (int i in Enumerable.Range(0, x.Length).OrderByDescending(i => bounds[i]))
        {
            double level = Level(best);
            if (bounds[i] < level)
            {
                break;
            }

            fs[i] = value(x[i], level);
            best = Math.Max(best, fs[i]);
        }

        return RefineSolvingPlateau(value, x, fs, stopShare * scale);
    }

    // The best sample, the middle of a plateau of equally best ones, or the golden-section maximum between the best
    // sample's neighbours when that beats it. Every sample at or above the plateau level is exact.
    private static (double X, double? Value) Refine(Func<double, double, double> f, double[] xs, double[] fs, double tolerance)
    {
        int k = Array.IndexOf(fs, fs.Max());
        double level = Level(fs[k]);
        var (first, last) = RunAt(fs, k, level);
        if (last > first)
        {
            return (xs[first] + ((xs[last] - xs[first]) / 2.0), null);
        }

        var (x, fx) = Golden(f, xs[Math.Max(k - 1, 0)], xs[Math.Min(k + 1, xs.Length - 1)], tolerance);
        return fx > fs[k] ? (x, fx) : (xs[k], fs[k]);
    }

    // Golden section between the best sample's neighbours; when that finds nothing better than the plateau level
    // allows, or the best samples already form a run, the run of values at that level is taken to be a plateau and
    // its ends are solved.
    private static double RefineSolvingPlateau(Func<double, double, double> f, double[] xs, double[] fs, double tolerance)
    {
        int k = Array.IndexOf(fs, fs.Max());
        double level = Level(fs[k]);
        var (first, last) = RunAt(fs, k, level);
        if (first == last)
        {
            var (x, fx) = Golden(f, xs[Math.Max(k - 1, 0)], xs[Math.Min(k + 1, xs.Length - 1)], tolerance);
            if (fx > fs[k] && Level(fx) > fs[k])
            {
                return x;
            }
        }

        double from = first > 0 ? PlateauEnd(f, xs[first - 1], xs[first], level, tolerance) : xs[first];
        double to = last < xs.Length - 1 ? PlateauEnd(f, xs[last + 1], xs[last], level, tolerance) : xs[last];
        double middle = from + ((to - from) / 2.0);

        // The stretch is taken to be one piece; should something dip in between, the best sample stands.
        return f(middle, level) >= level ? middle : xs[k];
    }

    // The end of {x : f(x) >= level} between a point below the level and one at or above it, bisected to the tolerance.
    private static double PlateauEnd(Func<double, double, double> f, double below, double atLevel, double level, double tolerance)
    {
        for (int i = 0; i < MaxIterations && Math.Abs(atLevel - below) > tolerance; i++)
        {
            double middle = below + ((atLevel - below) / 2.0);
            if (f(middle, level) >= level)
            {
                atLevel = middle;
            }
            else
            {
                below = middle;
            }
        }

        return atLevel;
    }

    // The samples next to k, k included, at or above the level.
    private static (int First, int Last) RunAt(double[] fs, int k, double level)
    {
        int first = k, last = k;
        while (first > 0 && fs[first - 1] >= level)
        {
            first--;
        }

        while (last < fs.Length - 1 && fs[last + 1] >= level)
        {
            last++;
        }

        return (first, last);
    }

    private static double Level(double best) => best - (PlateauShare * Math.Max(1.0, Math.Abs(best)));

    // Each new point is valued against the interior point it will be compared with: when it falls below, it is
    // dropped whatever its exact value, so the points kept are always exact.
    private static (double X, double F) Golden(Func<double, double, double> f, double a, double b, double tolerance)
    {
        double c = b - (InverseGolden * (b - a)), d = a + (InverseGolden * (b - a));
        double fc = f(c, double.NegativeInfinity), fd = f(d, fc);
        for (int i = 0; i < MaxIterations && b - a > tolerance; i++)
        {
            if (fc >= fd)
            {
                (b, d, fd) = (d, c, fc);
                c = b - (InverseGolden * (b - a));
                fc = f(c, fd);
            }
            else
            {
                (a, c, fc) = (c, d, fd);
                d = a + (InverseGolden * (b - a));
                fd = f(d, fc);
            }
        }

        return fc >= fd ? (c, fc) : (d, fd);
    }
}
