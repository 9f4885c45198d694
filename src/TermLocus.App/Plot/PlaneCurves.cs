using System.Collections.Immutable;
using System.Numerics;

namespace TermLocus.App.Plot;

/// <summary>Polylines for circles and arcs.</summary>
public static class PlaneCurves
{
    /// <summary>Segments per full turn: at the widest plot (about 320 dots across) the chord error stays under a dot.</summary>
    public const int DefaultSegmentsPerTurn = 180;

    /// <summary>An arc of the circle |s − <paramref name="centre"/>| = <paramref name="radius"/> from angle
    /// <paramref name="fromRadians"/> to <paramref name="toRadians"/> (counter-clockwise when to &gt; from),
    /// with both end points included.</summary>
    /// <param name="centre">Centre of the circle.</param>
    /// <param name="radius">Radius, &gt;= 0.</param>
    /// <param name="fromRadians">Start angle from the positive real axis, radians.</param>
    /// <param name="toRadians">End angle, radians.</param>
    /// <param name="segmentsPerTurn">Straight pieces a full circle would have, at least 8.</param>
    public static ImmutableArray<Complex> Arc(
        Complex centre, double radius, double fromRadians, double toRadians, int segmentsPerTurn = DefaultSegmentsPerTurn)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(radius);
        ArgumentOutOfRangeException.ThrowIfLessThan(segmentsPerTurn, 8);
        double sweep = toRadians - fromRadians;
        int segments = Math.Max(1, (int)Math.Ceiling(Math.Abs(sweep) / (2 * Math.PI) * segmentsPerTurn));
        var points = ImmutableArray.CreateBuilder<Complex>(segments + 1);
        for (int i = 0; i <= segments; i++)
        {
            double angle = fromRadians + (sweep * i / segments);
            points.Add(centre + Complex.FromPolarCoordinates(radius, angle));
        }

        return points.MoveToImmutable();
    }

    /// <summary>The whole circle, closed (first point repeated at the end).</summary>
    public static ImmutableArray<Complex> Circle(Complex centre, double radius, int segmentsPerTurn = DefaultSegmentsPerTurn) =>
        Arc(centre, radius, 0, 2 * Math.PI, segmentsPerTurn);
}
