using System.Collections.Immutable;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The <c>max_overshoot_pct</c> limit as the design judges it: at a swept value, the smallest relative margin
/// (limit − overshoot)/limit over the nominal point and every corner of the band, each point's overshoot measured on
/// its simulated step response by <see cref="OvershootCheck.Measure"/>, the measurement <see cref="LoopCheck"/> reports.
/// <para>A step response costs a simulation (0.05 to 1 ms for the demo plants, against microseconds for a root find),
/// so every point's margin is kept once computed, and a caller that only needs to know whether the margin is below
/// some floor lets the evaluation stop at the first point below it, starting with the point that was worst last.</para>
/// </summary>
internal sealed class DesignOvershoot
{
    private readonly LoopModel model;
    private readonly string sweep;
    private readonly Dictionary<string, double>[] points;
    private readonly ImmutableDictionary<string, double>[] toleranced;
    private readonly Dictionary<double, double[]> known = [];
    private int worst;

    private DesignOvershoot(LoopModel model, double limit, Dictionary<string, double>[] points, ImmutableDictionary<string, double>[] toleranced)
    {
        this.model = model;
        sweep = model.Plant.Loop.Sweep;
        Limit = limit;
        this.points = points;
        this.toleranced = toleranced;
    }

    /// <summary>The limit, percent.</summary>
    public double Limit { get; }

    /// <summary>
    /// The judge of <paramref name="model"/>'s overshoot limit at the full <paramref name="values"/> over
    /// <paramref name="box"/>; null when the specs set no limit or the loop gives only its characteristic polynomial
    /// (no step response, so <see cref="OvershootCheck"/> judges nothing either).
    /// </summary>
    public static DesignOvershoot? Create(LoopModel model, ImmutableDictionary<string, double> values, ToleranceBox box)
    {
        if (model.Plant.Specs.MaxOvershootPct is not double limit || model.HasGivenCharacteristic)
        {
            return null;
        }

        var points = new List<Dictionary<string, double>> { new(values, StringComparer.Ordinal) };
        var toleranced = new List<ImmutableDictionary<string, double>> { ImmutableDictionary<string, double>.Empty };
        for (int c = 0; c < box.CornerCount && !box.Axes.IsEmpty; c++)
        {
            var corner = new Dictionary<string, double>(values, StringComparer.Ordinal);
            box.WriteCorner(c, corner);
            points.Add(corner);
            toleranced.Add(box.Corner(c));
        }

        return new DesignOvershoot(model, limit, [.. points], [.. toleranced]);
    }

    /// <summary>
    /// The smallest relative margin at swept value <paramref name="p"/> (dimensionless; 1 for no overshoot, negative
    /// beyond the limit, −∞ where a point is unstable, has a steady state of 0 or cannot be simulated), exact when it
    /// is at least <paramref name="floor"/>; otherwise some value below <paramref name="floor"/> (the evaluation
    /// stops at the first point below it). +∞ when the nominal point has no response to judge (as the check).
    /// </summary>
    public double MarginAt(double p, double floor = double.NegativeInfinity)
    {
        if (!known.TryGetValue(p, out var margins))
        {
            margins = Enumerable.Repeat(double.NaN, points.Length).ToArray();
            known[p] = margins;
        }

        double smallest = Smallest(margins);
        if (smallest < floor || double.IsPositiveInfinity(margins[0]))
        {
            return smallest;
        }

        foreach (int i in Order())
        {
            if (!double.IsNaN(margins[i]))
            {
                continue;
            }

            margins[i] = Measure(i, p);
            if (i == 0 && double.IsPositiveInfinity(margins[0]))
            {
                return double.PositiveInfinity;
            }

            smallest = Math.Min(smallest, margins[i]);
            if (smallest < floor)
            {
                worst = i;
                return smallest;
            }
        }

        worst = Array.IndexOf(margins, smallest);
        return smallest;
    }

    /// <summary>The margin at <paramref name="p"/> when every point there has been simulated already, else null.</summary>
    public double? Known(double p) =>
        known.TryGetValue(p, out var margins) && (double.IsPositiveInfinity(margins[0]) || !margins.Any(double.IsNaN))
            ? Smallest(margins)
            : null;

    // The point that was worst last time first: near a given value it is usually the one that decides.
    private IEnumerable<int> Order()
    {
        yield return worst;
        for (int i = 0; i < points.Length; i++)
        {
            if (i != worst)
            {
                yield return i;
            }
        }
    }

    // A point with no response to judge (+∞) is skipped, as the check skips it; the nominal one decides alone.
    private static double Smallest(double[] margins)
    {
        if (double.IsPositiveInfinity(margins[0]))
        {
            return double.PositiveInfinity;
        }

        double smallest = double.PositiveInfinity;
        foreach (double m in margins)
        {
            if (!double.IsNaN(m))
            {
                smallest = Math.Min(smallest, m);
            }
        }

        return smallest;
    }

    private double Measure(int point, double p)
    {
        var values = points[point];
        values[sweep] = p;
        try
        {
            var outcome = OvershootCheck.Measure(model, values, Limit, toleranced[point], atCorner: point > 0);
            return outcome is null ? double.PositiveInfinity
                : double.IsNaN(outcome.WorstRelativeMargin) ? double.NegativeInfinity : outcome.WorstRelativeMargin;
        }
        catch (Exception e) when (e is PlantFileException or ArgumentException or ArithmeticException)
        {
            // The check would stop on this value; the design counts it as out of the limit.
            return double.NegativeInfinity;
        }
    }
}
