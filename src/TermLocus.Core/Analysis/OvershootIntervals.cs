namespace TermLocus.Core.Analysis;

/// <summary>
/// The parts of a pole-feasible interval where the overshoot limit holds too. Only pole-feasible values are simulated:
/// there every point is strictly stable, so each overshoot is finite and, away from degenerate cases (a steady state
/// passing through 0, a response grid that changes its sample count), continuous in the swept value.
/// <para>Method: the margin (<see cref="DesignOvershoot.MarginAt"/>) is sampled at <see cref="GridPoints"/> uniform
/// values including both ends; where three neighbouring feasible samples bend down towards the limit, the parabola
/// through them predicts the dip and up to <see cref="DipSteps"/> parabolic steps look for a value beyond it (an
/// overshoot hump between two samples); every sign change is then solved by <see cref="BracketedCrossing"/> to
/// <see cref="RelTol"/> of the end's own value. An excursion beyond the limit that no sample sees and no parabola
/// predicts is missed: overshoot has no exact boundary equations to give hints, as the pole limits have.</para>
/// </summary>
internal static class OvershootIntervals
{
    /// <summary>Samples of each pole-feasible interval, both ends included.</summary>
    public const int GridPoints = 17;

    /// <summary>
    /// Relative width of the final bracket of an overshoot end: 1e-9 of max(|end|, 1e-3 · scale). Finer would be
    /// noise: the figure itself is a simulated one (see <see cref="RobustDesign"/> for its accuracy).
    /// </summary>
    public const double RelTol = 1e-9;

    /// <summary>Most parabolic steps spent looking for a predicted dip below the limit between samples.</summary>
    public const int DipSteps = 4;

    /// <summary>
    /// The sub-intervals of [<paramref name="from"/>, <paramref name="to"/>] (pole-feasible) where the overshoot
    /// margin is &gt;= 0, ascending; every value sampled is added to <paramref name="sampled"/> (its margin is kept by
    /// <paramref name="overshoot"/>, for the recommendation to reuse). <paramref name="scale"/> is the span's scale.
    /// </summary>
    public static List<(double From, double To)> Within(
        DesignOvershoot overshoot, double from, double to, double scale, List<double> sampled)
    {
        double Margin(double p) => overshoot.MarginAt(p, 0.0);
        var xs = Enumerable.Range(0, GridPoints).Select(i => i == GridPoints - 1 ? to : from + ((to - from) * i / (GridPoints - 1)))
            .Distinct().ToList();
        var ms = xs.Select(Margin).ToList();
        AddDips(Margin, xs, ms);
        sampled.AddRange(xs);

        double floor = SignIntervals.ZeroFloorShare * scale;
        return FeasibleRuns.Collect(
            ms.ConvertAll(m => m >= 0.0), from, to, i => BracketedCrossing.Solve(Margin, xs[i - 1], ms[i - 1], xs[i], ms[i], RelTol, floor));
    }

    // A feasible sample lower than both feasible neighbours: follow the parabola through the three towards its lowest
    // point while it promises a value below the limit; a value found below it is inserted as a sample.
    private static void AddDips(Func<double, double> margin, List<double> xs, List<double> ms)
    {
        for (int i = xs.Count - 2; i >= 1; i--)
        {
            if (ms[i - 1] >= 0.0 && ms[i] >= 0.0 && ms[i + 1] >= 0.0 && ms[i] <= ms[i - 1] && ms[i] <= ms[i + 1]
                && DipBelowLimit(margin, (xs[i - 1], ms[i - 1]), (xs[i], ms[i]), (xs[i + 1], ms[i + 1])) is { } dip)
            {
                int at = dip.X < xs[i] ? i : i + 1;
                xs.Insert(at, dip.X);
                ms.Insert(at, dip.Margin);
            }
        }
    }

    private static (double X, double Margin)? DipBelowLimit(
        Func<double, double> margin, (double X, double M) a, (double X, double M) b, (double X, double M) c)
    {
        for (int step = 0; step < DipSteps; step++)
        {
            if (Vertex(a, b, c) is not { } v || v.M >= 0.0)
            {
                return null;
            }

            double x = Math.Clamp(v.X, a.X + ((c.X - a.X) * 1e-3), c.X - ((c.X - a.X) * 1e-3));
            if (x == b.X)
            {
                return null;
            }

            double m = margin(x);
            if (m < 0.0)
            {
                return (x, m);
            }

            // Keep the lowest sample between its two neighbours.
            (a, b, c) = m <= b.M
                ? (x < b.X ? (a, (x, m), b) : (b, (x, m), c))
                : (x < b.X ? ((x, m), b, c) : (a, b, (x, m)));
        }

        return null;
    }

    // The lowest point of the parabola through three points (Newton's form), when it opens upwards.
    private static (double X, double M)? Vertex((double X, double M) a, (double X, double M) b, (double X, double M) c)
    {
        double dab = (b.M - a.M) / (b.X - a.X), dbc = (c.M - b.M) / (c.X - b.X);
        double curvature = (dbc - dab) / (c.X - a.X);
        if (!(curvature > 0.0) || !double.IsFinite(curvature))
        {
            return null;
        }

        double x = ((a.X + b.X) / 2.0) - (dab / (2.0 * curvature));
        return (x, a.M + (dab * (x - a.X)) + (curvature * (x - a.X) * (x - b.X)));
    }
}
