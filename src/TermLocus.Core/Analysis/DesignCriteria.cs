namespace TermLocus.Core.Analysis;

/// <summary>
/// Everything a design judges at one swept value, over the nominal point and every corner of the band: the pole limits
/// and strict stability (<see cref="DesignPoints"/>, root finds) and, when the specs set one and the loop has a step
/// response, the overshoot limit (<see cref="DesignOvershoot"/>, simulations).
/// </summary>
internal sealed class DesignCriteria
{
    /// <summary>Judges <paramref name="points"/>' pole limits, and <paramref name="overshoot"/> when not null.</summary>
    public DesignCriteria(DesignPoints points, DesignOvershoot? overshoot)
    {
        Points = points;
        Overshoot = overshoot;
    }

    /// <summary>The pole side.</summary>
    public DesignPoints Points { get; }

    /// <summary>The overshoot side, or null when overshoot is not judged.</summary>
    public DesignOvershoot? Overshoot { get; }

    /// <summary>The keys of every limit judged, in report order: pole limits, <c>max_overshoot_pct</c>, stability.</summary>
    public IEnumerable<string> Keys
    {
        get
        {
            var keys = Points.Limits.Select(l => l.Spec.Key());
            return (Overshoot is null ? keys : keys.Append(SpecKind.MaxOvershootPct.Key())).Append(DesignMargin.StabilityKey);
        }
    }

    /// <summary>
    /// The design objective at <paramref name="p"/>, exact when at least <paramref name="floor"/>, otherwise some value
    /// below it (then no further response is simulated): −∞ where the loop is not formed or not stable at some point;
    /// without overshoot, <see cref="DesignMarginsAt.Smallest"/>; with it, the smaller of the smallest relative pole
    /// margin (left out when the file sets no pole limit) and the relative overshoot margin. With
    /// <paramref name="withOvershoot"/> false, the objective as if overshoot were not judged.
    /// </summary>
    public double Objective(double p, double floor, bool withOvershoot = true)
    {
        var m = Points.At(p);
        if (!m.Formed || !m.Stable)
        {
            return double.NegativeInfinity;
        }

        if (Overshoot is null || !withOvershoot)
        {
            return m.Smallest;
        }

        double pole = Points.Limits.Count == 0 ? double.PositiveInfinity : m.Smallest;
        if (pole < floor)
        {
            return pole;
        }

        double overshoot = Overshoot.MarginAt(p, floor);
        return double.IsPositiveInfinity(overshoot) ? m.Smallest : Math.Min(pole, overshoot);
    }

    /// <summary>
    /// A cheap upper bound of <see cref="Objective"/> at <paramref name="p"/>: the pole part, and the overshoot part
    /// only when every point's response there is simulated already.
    /// </summary>
    public double Bound(double p)
    {
        var m = Points.At(p);
        if (!m.Formed || !m.Stable)
        {
            return double.NegativeInfinity;
        }

        if (Overshoot is null)
        {
            return m.Smallest;
        }

        double pole = Points.Limits.Count == 0 ? double.PositiveInfinity : m.Smallest;
        return Overshoot.Known(p) is double known && !double.IsPositiveInfinity(known) ? Math.Min(pole, known) : pole;
    }

    /// <summary>
    /// The keys of the limits violated at <paramref name="p"/> (empty where the loop cannot be formed). Overshoot is
    /// named only where every point is stable: an unstable loop's unbounded response says nothing more.
    /// </summary>
    public HashSet<string> Violated(double p)
    {
        var keys = new HashSet<string>(StringComparer.Ordinal);
        var margins = Points.At(p);
        if (!margins.Formed)
        {
            return keys;
        }

        for (int k = 0; k < Points.Limits.Count; k++)
        {
            if (margins.Relative[k] < 0.0)
            {
                keys.Add(Points.Limits[k].Spec.Key());
            }
        }

        if (!margins.Stable)
        {
            keys.Add(DesignMargin.StabilityKey);
        }
        else if (Overshoot is not null && Overshoot.MarginAt(p, 0.0) < 0.0)
        {
            keys.Add(SpecKind.MaxOvershootPct.Key());
        }

        return keys;
    }
}
