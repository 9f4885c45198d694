using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The warped parameter u = asinh(p / unit) in which the tracer samples evenly: linear for |p| below the unit,
/// logarithmic above it, symmetric through zero. The unit is the swept value at which the poles have just started
/// to move away from where they are at p = 0, so ranges spanning many decades (high-degree loops need gains of
/// 1e15 and more to send their poles along the asymptotes) are still sampled densely where poles move fastest.
/// </summary>
internal readonly record struct TraceParameterWarp(double Unit)
{
    /// <summary>Share of the range's largest magnitude used as the unit when the probe does not apply.</summary>
    private const double LinearShare = 1e-3;

    /// <summary>The probe divides the unit by this until the poles barely move.</summary>
    private const double ProbeFactor = 100.0;

    private const int MaxProbes = 20;

    internal static TraceParameterWarp For(double from, double to) =>
        new(Math.Max(Math.Abs(from), Math.Abs(to)) * LinearShare);

    /// <summary>
    /// A warp whose unit is at most the range-based one and small enough that at p = ±unit the poles of p = 0 have
    /// moved about <paramref name="move"/> (rad/s) or less: from their speed |B(r)/A'(r)| for an affine family, by
    /// probing otherwise. Skipped when the range is far from p = 0 or P(s; 0) has no roots.
    /// </summary>
    internal static TraceParameterWarp For(CharacteristicFamily family, double from, double to, double move)
    {
        var plain = For(from, to);
        bool nearZero = (from <= 0.0 && to >= 0.0) || Math.Min(Math.Abs(from), Math.Abs(to)) < plain.Unit;
        var atZero = family.At(0.0);
        if (!nearZero || atZero.Degree < 1)
        {
            return plain;
        }

        var reference = PolynomialRoots.Find(atZero);
        double unit = family.Affine is { } split
            ? Math.Min(plain.Unit, move / FastestStart(split, reference))
            : Probe(family, reference, to > 0.0 ? 1.0 : -1.0, plain.Unit, move);
        return new TraceParameterWarp(unit);
    }

    /// <summary>Largest |dr/dp| = |B(r)/A'(r)| over the simple roots r of A (speed of the poles leaving p = 0).</summary>
    private static double FastestStart(AffineSplit split, Complex[] roots)
    {
        var slope = split.A.Derivative();
        double fastest = 0.0;
        foreach (var r in roots)
        {
            double speed = split.B.Evaluate(r).Magnitude / slope.Evaluate(r).Magnitude;
            if (double.IsFinite(speed))
            {
                fastest = Math.Max(fastest, speed);
            }
        }

        return fastest;
    }

    /// <summary>Divides the unit by <see cref="ProbeFactor"/> until the poles at ±unit have barely moved.</summary>
    private static double Probe(CharacteristicFamily family, Complex[] reference, double sign, double unit, double move)
    {
        for (int i = 0; i < MaxProbes && LargestMove(family, reference, sign * unit) > move; i++)
        {
            unit /= ProbeFactor;
        }

        return unit;
    }

    internal double ToWarped(double p) => Math.Asinh(p / Unit);

    internal double ToValue(double u) => Unit * Math.Sinh(u);

    /// <summary>Largest distance from a reference pole to its nearest pole at p (poles coming in from infinity are
    /// not anyone's nearest, so a degree drop at 0 does not disturb the probe).</summary>
    private static double LargestMove(CharacteristicFamily family, Complex[] reference, double p)
    {
        var poly = family.At(p);
        if (poly.Degree < 1)
        {
            return double.PositiveInfinity;
        }

        var roots = PolynomialRoots.Find(poly);
        return reference.Max(r => roots.Min(z => Complex.Abs(z - r)));
    }
}
