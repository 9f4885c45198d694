using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Exact values at which some pole crosses a boundary curve h(s) = 0 of the s-plane (h &gt;= 0 on the allowed
/// side): sign changes of h along each traced branch, refined by Brent's method on h of the pole followed by
/// Newton's method from the branch, so the value comes from the exact polynomial, never from the grid.
/// Conjugate poles cross together; only the upper one (or the real one) is reported.
/// </summary>
internal static class TraceCrossingFinder
{
    /// <summary>Branch segments whose imaginary parts are below −this share of the scale are lower mirrors: skipped.</summary>
    private const double MirrorShare = 1e-9;

    /// <summary>A local minimum of h at most this share of the scale is a touch of the boundary.</summary>
    private const double TouchShare = 1e-9;

    private const double InverseGolden = 0.6180339887498949;
    private const int GoldenIterations = 120;
    private const double GoldenTolerance = 1e-12;

    /// <summary>A sign change with both |h| below this share of the scale is rounding noise of a pole that sits on
    /// the boundary for good (a hidden pole at the origin, say), not a crossing.</summary>
    private const double NoiseShare = 1e-10;

    /// <summary>Crossings closer than this share of |p| are one crossing.</summary>
    private const double SameValueShare = 1e-9;

    /// <summary>A crossing: the value, the pole on the boundary there, and whether h rises (the pole enters the
    /// allowed side) as p increases.</summary>
    internal readonly record struct Crossing(double Value, Complex Pole, bool Entering);

    internal static List<Crossing> Find(CharacteristicFamily family, LocusTrace trace, Func<Complex, double> h)
    {
        var found = new List<Crossing>();
        foreach (var branch in trace.Branches)
        {
            var points = branch.Points;
            for (int i = 0; i + 1 < points.Length; i++)
            {
                var (a, b) = (points[i], points[i + 1]);
                double ha = h(a.Pole), hb = h(b.Pole);
                if ((ha >= 0.0) == (hb >= 0.0) || a.Pole.Imaginary + b.Pole.Imaginary < -MirrorShare * trace.Scale
                    || Math.Max(Math.Abs(ha), Math.Abs(hb)) <= NoiseShare * trace.Scale)
                {
                    continue;
                }

                found.Add(Refine(family, a, b, ha, hb, h));
            }
        }

        return Deduplicate(found);
    }

    /// <summary>
    /// Values where a pole touches the boundary without crossing it: local minima of h &gt;= 0 along a branch, within
    /// one step bound of the boundary, that reach h = 0 (to <see cref="TouchShare"/> of the scale). Located by
    /// golden-section search, so to about 1e-8 relative (a touch is a double zero of h).
    /// </summary>
    internal static List<double> FindTouches(CharacteristicFamily family, LocusTrace trace, Func<Complex, double> h)
    {
        var found = new List<double>();
        foreach (var branch in trace.Branches)
        {
            var points = branch.Points;
            for (int i = 1; i + 1 < points.Length; i++)
            {
                var (a, m, b) = (points[i - 1], points[i], points[i + 1]);
                double hm = h(m.Pole);
                if (!(h(a.Pole) > hm && hm <= h(b.Pole) && hm >= 0.0 && hm <= trace.AllowedStep(a.Pole, m.Pole))
                    || m.Pole.Imaginary < -MirrorShare * trace.Scale)
                {
                    continue;
                }

                var (value, least) = LowestPoint(family, a, m, b, h);
                if (least <= TouchShare * trace.Scale)
                {
                    found.Add(value);
                }
            }
        }

        return found;
    }

    private static (double Value, double Least) LowestPoint(CharacteristicFamily family, LocusPoint a, LocusPoint m,
        LocusPoint b, Func<Complex, double> h)
    {
        double F(double p) => h(p <= m.Value ? PoleAt(family, a, m, p) : PoleAt(family, m, b, p));
        double lo = a.Value, hi = b.Value;
        double x1 = hi - (InverseGolden * (hi - lo)), x2 = lo + (InverseGolden * (hi - lo));
        double f1 = F(x1), f2 = F(x2);
        for (int i = 0; i < GoldenIterations && hi - lo > GoldenTolerance * Math.Max(Math.Abs(lo), Math.Abs(hi)); i++)
        {
            if (f1 <= f2)
            {
                (hi, x2, f2) = (x2, x1, f1);
                x1 = hi - (InverseGolden * (hi - lo));
                f1 = F(x1);
            }
            else
            {
                (lo, x1, f1) = (x1, x2, f2);
                x2 = lo + (InverseGolden * (hi - lo));
                f2 = F(x2);
            }
        }

        return f1 <= f2 ? (x1, f1) : (x2, f2);
    }

    /// <summary>The root of P(s; p) continuing the branch segment a–b, by Newton's method from linear interpolation.</summary>
    private static Complex PoleAt(CharacteristicFamily family, LocusPoint a, LocusPoint b, double p)
    {
        double t = (p - a.Value) / (b.Value - a.Value);
        var guess = a.Pole + (t * (b.Pole - a.Pole));
        return LocusNewton.Polish(family.At(p), guess);
    }

    private static Crossing Refine(CharacteristicFamily family, LocusPoint a, LocusPoint b, double ha, double hb,
        Func<Complex, double> h)
    {
        Complex PoleAt(double p) => TraceCrossingFinder.PoleAt(family, a, b, p);

        double tolerance = 1e-15 * Math.Max(Math.Abs(a.Value), Math.Abs(b.Value));
        double value = LocusBrent.Solve(p => h(PoleAt(p)), a.Value, b.Value, ha, hb, tolerance);
        var pole = PoleAt(value);
        return new Crossing(value, new Complex(pole.Real, Math.Abs(pole.Imaginary)), hb >= 0.0);
    }

    private static List<Crossing> Deduplicate(List<Crossing> found)
    {
        var kept = new List<Crossing>();
        foreach (var c in found.OrderBy(c => c.Value))
        {
            if (kept.Count > 0 && Math.Abs(kept[^1].Value - c.Value) <= SameValueShare * Math.Abs(c.Value)
                && Complex.Abs(kept[^1].Pole - c.Pole) <= SameValueShare * Math.Max(c.Pole.Magnitude, 1e-300))
            {
                continue;
            }

            kept.Add(c);
        }

        return kept;
    }
}
