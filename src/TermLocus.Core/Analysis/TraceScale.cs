using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>The default view scale of a trace: how large the interesting part of the s-plane is.</summary>
internal static class TraceScale
{
    /// <summary>Used when every reference pole sits at the origin, rad/s.</summary>
    private const double Fallback = 1.0;

    /// <summary>Poles closer to the origin than this (rad/s, a time constant of some 30 years) count as at the
    /// origin: no physical loop has a smaller scale, and a scale of 1e-77 would make the step bound meaningless.</summary>
    internal const double OriginRadius = 1e-9;

    /// <summary>
    /// Largest magnitude of the open-loop poles and zeros for an affine family, else of the poles at
    /// <paramref name="from"/>; failing that (all within <see cref="OriginRadius"/> of the origin) of the poles at
    /// <paramref name="to"/>; else 1 rad/s.
    /// </summary>
    internal static double Default(CharacteristicFamily family, double from, double to)
    {
        double s = family.Affine is { } split
            ? Math.Max(LargestRoot(split.A), LargestRoot(split.B))
            : LargestRoot(family.At(from));
        if (!(s > OriginRadius))
        {
            s = LargestRoot(family.At(to));
        }

        return s > OriginRadius && double.IsFinite(s) ? s : Fallback;
    }

    /// <summary>Largest root magnitude of <paramref name="p"/>; 0 for a constant or zero polynomial.</summary>
    internal static double LargestRoot(Polynomial p)
    {
        if (p.Degree < 1)
        {
            return 0.0;
        }

        double m = 0.0;
        foreach (var r in PolynomialRoots.Find(p))
        {
            m = Math.Max(m, r.Magnitude);
        }

        return m;
    }
}
