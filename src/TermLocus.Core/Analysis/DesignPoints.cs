using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;
using TermLocus.Core.Plants;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The points of the tolerance band a design is checked at (the nominal point and every corner of the box), each
/// with its characteristic family in the swept parameter, and the margins of all of them at one swept value.
/// </summary>
internal sealed class DesignPoints
{
    /// <summary>
    /// A pole counts as strictly stable when Re s &lt; −this share of the largest pole magnitude, so a pole that sits
    /// on the imaginary axis for every value (a hidden factor) is not taken for a stable one by rounding. Small enough
    /// to move a solved stability end by far less than 1e-9 relative.
    /// </summary>
    public const double StabilityShare = 1e-12;

    private readonly (SpecKind Spec, double Limit)[] limits;
    private readonly LoopPlane plane;

    private DesignPoints(ImmutableArray<DesignPoint> points, (SpecKind, double)[] limits, LoopPlane plane)
    {
        Points = points;
        this.limits = limits;
        this.plane = plane;
    }

    /// <summary>Nominal point first, then the corners in <see cref="ToleranceBox"/> order (the nominal alone without axes).</summary>
    public ImmutableArray<DesignPoint> Points { get; }

    /// <summary>The pole limits checked, in <see cref="SpecKind"/> order.</summary>
    public IReadOnlyList<(SpecKind Spec, double Limit)> Limits => limits;

    /// <summary>The points of <paramref name="box"/> for <paramref name="model"/> at <paramref name="values"/> (full set).</summary>
    /// <exception cref="PlantFileException">A part of the loop free of the swept parameter cannot be formed at some point.</exception>
    public static DesignPoints Create(LoopModel model, ImmutableDictionary<string, double> values, ToleranceBox box)
    {
        string sweep = model.Plant.Loop.Sweep;
        var points = ImmutableArray.CreateBuilder<DesignPoint>(box.CornerCount + 1);
        points.Add(new DesignPoint(box.Axes.ToImmutableDictionary(a => a.Name, a => values[a.Name], StringComparer.Ordinal),
            IsCorner: box.Axes.IsEmpty, model.Family(sweep, values)));
        var work = new Dictionary<string, double>(values, StringComparer.Ordinal);
        for (int c = 0; c < box.CornerCount && !box.Axes.IsEmpty; c++)
        {
            box.WriteCorner(c, work);
            points.Add(new DesignPoint(box.Corner(c), IsCorner: true, model.Family(sweep, work)));
        }

        return new DesignPoints(points.ToImmutable(), [.. SpecCheck.Limits(model.Plant.Specs)], model.Plane);
    }

    /// <summary>The margins at swept value <paramref name="p"/>, the smallest over every point.</summary>
    public DesignMarginsAt At(double p)
    {
        var relative = Enumerable.Repeat(double.PositiveInfinity, limits.Length).ToArray();
        bool stable = true;
        double slowest = double.PositiveInfinity;
        foreach (var point in Points)
        {
            if (!TryPoles(point.Family, p, out var poles, out int infinite))
            {
                return DesignMarginsAt.Unformed(limits.Length);
            }

            stable &= infinite == 0 && IsStrictlyStable(poles);
            foreach (var pole in poles)
            {
                var metrics = PoleMetrics.Of(pole);
                slowest = Math.Min(slowest, metrics.DecayRate);
                for (int k = 0; k < limits.Length; k++)
                {
                    var (spec, limit) = limits[k];
                    double margin = SpecCheck.Measure(spec, limit, metrics).Margin;
                    relative[k] = Math.Min(relative[k], limit == 0.0 ? margin : margin / Math.Abs(limit));
                }
            }
        }

        return new DesignMarginsAt(true, stable, slowest, relative);
    }

    private static bool IsStrictlyStable(List<Complex> poles)
    {
        double largest = 0.0, rightmost = double.NegativeInfinity;
        foreach (var s in poles)
        {
            largest = Math.Max(largest, s.Magnitude);
            rightmost = Math.Max(rightmost, s.Real);
        }

        return poles.Count == 0 || rightmost < -StabilityShare * largest;
    }

    // Finite equivalent s-plane poles (a sampled root at z = 0 is a deadbeat mode and meets every limit).
    private bool TryPoles(CharacteristicFamily family, double p, out List<Complex> poles, out int infinite)
    {
        poles = [];
        infinite = 0;
        Polynomial polynomial;
        try
        {
            polynomial = family.At(p);
        }
        catch (PlantFileException)
        {
            return false;
        }

        if (polynomial.IsZero || !PolynomialRoots.TryFindWithInfinite(polynomial, RootFindingOptions.Default, out var roots))
        {
            return false;
        }

        infinite = roots.InfiniteCount;
        foreach (var root in roots.Finite)
        {
            if (plane.IsSampled && root == Complex.Zero)
            {
                continue;
            }

            poles.Add(plane.ToEquivalentS(root));
        }

        return true;
    }
}
