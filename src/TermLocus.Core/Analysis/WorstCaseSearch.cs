using System.Collections.Immutable;
using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Finds the worst value of a pole figure (lowest ζ, lowest decay rate, a spec margin...) over a tolerance box.
/// Every corner is evaluated; then, from the worst corner, each axis is sampled inside the band and, where the figure
/// dips below both ends (it is not monotone along that axis), refined by golden-section search. This finds interior
/// minima of figures that are unimodal along each axis; it is a search, not a proof.
/// </summary>
public static class WorstCaseSearch
{
    /// <summary>Interior samples per axis used to detect a figure that is not monotone along it.</summary>
    public const int InteriorSamples = 6;

    /// <summary>Golden-section iterations: the band is narrowed to about 1e-6 of its width.</summary>
    public const int RefineIterations = 30;

    /// <summary>
    /// The poles at every corner of <paramref name="box"/>, the other parameters from <paramref name="values"/>.
    /// <paramref name="polesAt"/> receives a full set of values and returns the finite closed-loop poles there.
    /// </summary>
    public static ImmutableArray<BandPoint> EvaluateCorners(
        ToleranceBox box,
        IReadOnlyDictionary<string, double> values,
        Func<IReadOnlyDictionary<string, double>, Complex[]> polesAt)
    {
        var work = new Dictionary<string, double>(values, StringComparer.Ordinal);
        var result = ImmutableArray.CreateBuilder<BandPoint>(box.CornerCount);
        for (int c = 0; c < box.CornerCount; c++)
        {
            box.WriteCorner(c, work);
            result.Add(new BandPoint(box.Corner(c), polesAt(work).ToImmutableArray(), IsCorner: true));
        }

        return result.MoveToImmutable();
    }

    /// <summary>
    /// The lowest value of <paramref name="figure"/> (a function of the poles; lower is worse; may return
    /// <see cref="double.NegativeInfinity"/> but not NaN) over the box, starting from the evaluated
    /// <paramref name="corners"/>. Throws <see cref="ArgumentException"/> when <paramref name="corners"/> is empty.
    /// </summary>
    public static BandMinimum Minimize(
        ToleranceBox box,
        IReadOnlyDictionary<string, double> values,
        ImmutableArray<BandPoint> corners,
        Func<IReadOnlyList<Complex>, double> figure,
        Func<IReadOnlyDictionary<string, double>, Complex[]> polesAt)
    {
        if (corners.IsDefaultOrEmpty)
        {
            throw new ArgumentException("No corners were evaluated.", nameof(corners));
        }

        var best = corners.Select(c => new BandMinimum(figure(c.Poles), c)).MinBy(m => m.Value)!;
        var search = new AxisSearch(box, values, figure, polesAt);
        for (int sweep = 0; sweep < 2; sweep++)
        {
            bool improved = false;
            for (int axis = 0; axis < box.Axes.Length; axis++)
            {
                var candidate = search.Along(axis, best);
                if (candidate.Value < best.Value - (1e-12 * Math.Max(1.0, Math.Abs(best.Value))))
                {
                    best = candidate;
                    improved = true;
                }
            }

            if (!improved)
            {
                break;
            }
        }

        return best;
    }

    private sealed class AxisSearch(
        ToleranceBox box,
        IReadOnlyDictionary<string, double> values,
        Func<IReadOnlyList<Complex>, double> figure,
        Func<IReadOnlyDictionary<string, double>, Complex[]> polesAt)
    {
        private readonly Dictionary<string, double> work = new(values, StringComparer.Ordinal);

        public BandMinimum Along(int axis, BandMinimum from)
        {
            var band = box.Axes[axis].Band;
            if (band.Width <= 0.0)
            {
                return from;
            }

            int n = InteriorSamples + 2;
            var xs = new double[n];
            var fs = new double[n];
            for (int i = 0; i < n; i++)
            {
                xs[i] = band.Low + (band.Width * i / (n - 1));
                fs[i] = Evaluate(axis, xs[i], from).Value;
            }

            int k = Array.IndexOf(fs, fs.Min());
            if (k == 0 || k == n - 1)
            {
                return from; // monotone-looking: the corner already holds the minimum along this axis
            }

            return Golden(axis, xs[k - 1], xs[k + 1], from);
        }

        private BandMinimum Golden(int axis, double a, double b, BandMinimum from)
        {
            double r = (Math.Sqrt(5.0) - 1.0) / 2.0;
            double c = b - (r * (b - a)), d = a + (r * (b - a));
            var fc = Evaluate(axis, c, from);
            var fd = Evaluate(axis, d, from);
            for (int i = 0; i < RefineIterations; i++)
            {
                if (fc.Value < fd.Value)
                {
                    b = d; d = c; fd = fc;
                    c = b - (r * (b - a));
                    fc = Evaluate(axis, c, from);
                }
                else
                {
                    a = c; c = d; fc = fd;
                    d = a + (r * (b - a));
                    fd = Evaluate(axis, d, from);
                }
            }

            return fc.Value < fd.Value ? fc : fd;
        }

        private BandMinimum Evaluate(int axis, double x, BandMinimum from)
        {
            foreach (var (name, v) in from.At.Toleranced)
            {
                work[name] = v;
            }

            work[box.Axes[axis].Name] = x;
            var poles = polesAt(work);
            var point = new BandPoint(from.At.Toleranced.SetItem(box.Axes[axis].Name, x), poles.ToImmutableArray(), IsCorner: false);
            return new BandMinimum(figure(poles), point);
        }
    }
}
