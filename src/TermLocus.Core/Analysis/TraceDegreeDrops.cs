using System.Collections.Immutable;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The nominal degree N of P(s; p) over a range and the values where its s^N coefficient vanishes, so that a root
/// passes through infinity. Exact for affine families (one linear equation); for other families found on a scan
/// and refined by bisection to the last representable value.
/// </summary>
internal sealed record TraceDegreeDrops(int NominalDegree, ImmutableArray<double> Values)
{
    /// <summary>Scan steps used to bracket sign changes of the leading coefficient of a non-affine family.</summary>
    internal const int ScanIntervals = 256;

    private const int MaxBisections = 200;

    internal static TraceDegreeDrops Find(CharacteristicFamily family, double from, double to)
    {
        return family.Affine is { } split ? FromAffine(split, from, to) : Scan(family, from, to);
    }

    private static TraceDegreeDrops FromAffine(AffineSplit split, double from, double to)
    {
        int n = Math.Max(split.A.Degree, split.B.Degree);
        double b = split.B[n];
        if (n < 0 || b == 0.0)
        {
            return new TraceDegreeDrops(n, []);
        }

        // c_N(p) = a_N + p·b_N; when deg B > deg A the drop is at p = 0 exactly.
        double drop = split.A[n] == 0.0 ? 0.0 : -split.A[n] / b;
        return new TraceDegreeDrops(n, drop >= from && drop <= to ? [drop] : []);
    }

    private static TraceDegreeDrops Scan(CharacteristicFamily family, double from, double to)
    {
        var warp = TraceParameterWarp.For(from, to);
        double u0 = warp.ToWarped(from), u1 = warp.ToWarped(to);
        var values = new double[ScanIntervals + 1];
        var polys = new Polynomial[ScanIntervals + 1];
        int nominal = -1;
        for (int i = 0; i <= ScanIntervals; i++)
        {
            values[i] = i == 0 ? from : i == ScanIntervals ? to : warp.ToValue(u0 + ((u1 - u0) * i / ScanIntervals));
            polys[i] = family.At(values[i]);
            nominal = Math.Max(nominal, polys[i].Degree);
        }

        var drops = ImmutableArray.CreateBuilder<double>();
        for (int i = 0; i <= ScanIntervals; i++)
        {
            double c = polys[i][nominal];
            if (c == 0.0)
            {
                drops.Add(values[i]);
            }
            else if (i < ScanIntervals && Math.Sign(c) * Math.Sign(polys[i + 1][nominal]) < 0)
            {
                drops.Add(Bisect(family, nominal, values[i], values[i + 1]));
            }
        }

        return new TraceDegreeDrops(nominal, drops.ToImmutable());
    }

    /// <summary>Bisects the sign change of the s^N coefficient down to adjacent doubles.</summary>
    private static double Bisect(CharacteristicFamily family, int degree, double a, double b)
    {
        double fa = family.At(a)[degree];
        for (int i = 0; i < MaxBisections; i++)
        {
            double m = 0.5 * (a + b);
            if (m <= Math.Min(a, b) || m >= Math.Max(a, b))
            {
                break;
            }

            double fm = family.At(m)[degree];
            if (fm == 0.0)
            {
                return m;
            }

            if (Math.Sign(fm) == Math.Sign(fa))
            {
                (a, fa) = (m, fm);
            }
            else
            {
                b = m;
            }
        }

        return 0.5 * (a + b);
    }
}
