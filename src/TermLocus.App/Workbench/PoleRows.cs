using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Analysis;

namespace TermLocus.App.Workbench;

/// <summary>Groups closed-loop poles into table rows: one per real pole or conjugate pair, least stable first.</summary>
public static class PoleRows
{
    /// <summary>An imaginary part below this fraction of the pole's magnitude counts as zero (root-finder dust).</summary>
    public const double RealTolerance = 1e-7;

    /// <summary>
    /// True when <paramref name="root"/> lies on the stability boundary of <paramref name="plane"/>: real part exactly 0
    /// (the origin included), or magnitude exactly 1 in a sampled loop. Exact, as <see cref="LoopPlane.IsStable"/> is.
    /// </summary>
    public static bool OnBoundary(Complex root, LoopPlane plane) =>
        plane.IsSampled ? Complex.Abs(root) == 1.0 : root.Real == 0.0;

    /// <summary>The rows for s-plane <paramref name="poles"/>, sorted by real part, largest (least stable) first.</summary>
    public static ImmutableArray<PoleRow> Group(ImmutableArray<Complex> poles) => Group(poles, LoopPlane.Continuous);

    /// <summary>The rows for <paramref name="poles"/>, roots in <paramref name="plane"/>, least stable (largest
    /// equivalent real part) first.</summary>
    public static ImmutableArray<PoleRow> Group(ImmutableArray<Complex> poles, LoopPlane plane)
    {
        var rows = new List<(PoleRow Row, double Real)>();
        foreach (var pole in poles)
        {
            double scale = Math.Max(1.0, Complex.Abs(pole));
            Complex shown;
            if (Math.Abs(pole.Imaginary) <= RealTolerance * scale)
            {
                shown = new Complex(pole.Real, 0);
            }
            else if (pole.Imaginary > 0)
            {
                shown = pole;
            }
            else
            {
                continue;
            }

            var s = plane.ToEquivalentS(shown);
            var row = new PoleRow(shown, shown.Imaginary != 0, plane.MetricsOf(shown), plane.IsStable(shown), OnBoundary(shown, plane));
            rows.Add((row, double.IsFinite(s.Real) ? s.Real : double.NegativeInfinity));
        }

        return rows
            .OrderByDescending(r => r.Real)
            .ThenByDescending(r => r.Row.Pole.Imaginary)
            .Select(r => r.Row)
            .ToImmutableArray();
    }
}
