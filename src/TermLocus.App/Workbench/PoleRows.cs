using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Analysis;

namespace TermLocus.App.Workbench;

/// <summary>Groups closed-loop poles into table rows: one per real pole or conjugate pair, rightmost first.</summary>
public static class PoleRows
{
    /// <summary>An imaginary part below this fraction of the pole's magnitude counts as zero (root-finder dust).</summary>
    public const double RealTolerance = 1e-7;

    /// <summary>The rows for <paramref name="poles"/>, sorted by real part, largest (least stable) first.</summary>
    public static ImmutableArray<PoleRow> Group(ImmutableArray<Complex> poles)
    {
        var rows = new List<PoleRow>();
        foreach (var pole in poles)
        {
            double scale = Math.Max(1.0, Complex.Abs(pole));
            if (Math.Abs(pole.Imaginary) <= RealTolerance * scale)
            {
                var real = new Complex(pole.Real, 0);
                rows.Add(new PoleRow(real, false, PoleMetrics.Of(real)));
            }
            else if (pole.Imaginary > 0)
            {
                rows.Add(new PoleRow(pole, true, PoleMetrics.Of(pole)));
            }
        }

        return rows
            .OrderByDescending(r => r.Pole.Real)
            .ThenByDescending(r => r.Pole.Imaginary)
            .ToImmutableArray();
    }
}
