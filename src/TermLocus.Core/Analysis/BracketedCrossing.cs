namespace TermLocus.Core.Analysis;

/// <summary>
/// Where a function crosses from &gt;= 0 to &lt; 0 inside a bracket, for functions too dear to bisect: the Illinois
/// variant of regula falsi (Dowell and Jarratt, BIT 11, 1971, from memory), which keeps the bracket, converges
/// superlinearly on a smooth crossing, and takes a bisection step whenever two steps in a row failed to halve the
/// bracket, so it never needs more steps than about three times bisection would.
/// </summary>
internal static class BracketedCrossing
{
    private const int MaxIterations = 200;

    /// <summary>
    /// The crossing of <paramref name="f"/> between <paramref name="a"/> &lt; <paramref name="b"/>, where
    /// <paramref name="fa"/> = f(a) and <paramref name="fb"/> = f(b) lie on opposite sides of 0 (&gt;= 0 counts as
    /// the feasible side; NaN as infeasible). Returns the feasible side's end of the final bracket, whose width is at
    /// most <paramref name="relTol"/> · max(|a|, |b|, <paramref name="floor"/>). The values only shape the steps: a
    /// value on the infeasible side may be any negative number (a bound), the bracket stays correct.
    /// </summary>
    public static double Solve(Func<double, double> f, double a, double fa, double b, double fb, double relTol, double floor)
    {
        bool feasibleAtA = IsFeasible(fa);
        double reference = b - a;
        int sinceHalved = 0, stuck = 0;
        for (int i = 0; i < MaxIterations && b - a > relTol * Math.Max(floor, Math.Max(Math.Abs(a), Math.Abs(b))); i++)
        {
            double c = Next(a, fa, b, fb, bisect: sinceHalved >= 2);
            double fc = f(c);
            if (IsFeasible(fc) == IsFeasible(fa))
            {
                (a, fa) = (c, fc);
                fb = stuck == +1 ? fb / 2.0 : fb;
                stuck = +1;
            }
            else
            {
                (b, fb) = (c, fc);
                fa = stuck == -1 ? fa / 2.0 : fa;
                stuck = -1;
            }

            if (b - a <= reference / 2.0)
            {
                reference = b - a;
                sinceHalved = 0;
            }
            else
            {
                sinceHalved++;
            }
        }

        return feasibleAtA ? a : b;
    }

    // The zero of the line through both ends, or the midpoint when bisecting, when a value is not finite, or when the
    // line's zero is not strictly inside (rounding at a tiny bracket).
    private static double Next(double a, double fa, double b, double fb, bool bisect)
    {
        double middle = a + ((b - a) / 2.0);
        if (bisect || !double.IsFinite(fa) || !double.IsFinite(fb) || fa == fb)
        {
            return middle;
        }

        double c = a + ((b - a) * (fa / (fa - fb)));
        return c > a && c < b ? c : middle;
    }

    private static bool IsFeasible(double v) => v >= 0.0;
}
