using System.Collections.Immutable;
using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Imaginary-axis crossings of an affine family P = A + p·B, solved exactly: at s = jω, p = −A(jω)/B(jω) must be
/// real, so Im(A(jω)·conj(B(jω))) = 0, an odd real polynomial ω·Q(ω²). Each root is then polished by Newton's
/// method on the two real equations Re P(jω; p) = 0, Im P(jω; p) = 0 in the unknowns (ω, p).
/// </summary>
internal static class AxisCrossingFinder
{
    /// <summary>A root x = ω² of Q counts as real when |Im x| is below this share of max(|x|, ω unit²).</summary>
    private const double RealRootTolerance = 1e-6;

    /// <summary>After polishing, |P(jω; p)| must be below this share of |A(jω)| + |p·B(jω)|.</summary>
    private const double ResidualTolerance = 1e-8;

    /// <summary>A + p·B counts as identically zero when every coefficient cancels to this share of its terms.</summary>
    private const double VanishingTolerance = 1e-12;

    private const int NewtonIterations = 30;

    /// <summary>A solution (ω, p), with whether it is an open-loop pole on the axis (A(jω) = 0, p = 0).</summary>
    internal readonly record struct Solution(double Omega, double Value, bool OpenLoopPole, AxisCrossingDirection Direction);

    /// <summary>
    /// Crossings with p in [from, to], ordered by p then ω. Open-loop poles on the axis (p = 0) are listed only
    /// when 0 lies strictly inside the range, where a pole really passes through them.
    /// </summary>
    internal static ImmutableArray<AxisCrossing> Find(AffineSplit split, double from, double to) =>
        [.. Solutions(split)
            .Where(x => LocusRange.Contains(from, to, x.Value) && (!x.OpenLoopPole || (from < 0.0 && to > 0.0)))
            .Where(x => !VanishesAt(split, x.Value))
            .Select(x => new AxisCrossing(x.Omega, x.Value, x.Direction))];

    /// <summary>
    /// True when A + p·B is identically zero (A and B proportional, every coefficient cancelled to within
    /// <see cref="VanishingTolerance"/>): every s solves P there, so no pole crosses the axis at that value.
    /// </summary>
    private static bool VanishesAt(AffineSplit split, double p)
    {
        int n = Math.Max(split.A.Degree, split.B.Degree);
        for (int k = 0; k <= n; k++)
        {
            double a = split.A[k], b = p * split.B[k];
            if (Math.Abs(a + b) > VanishingTolerance * (Math.Abs(a) + Math.Abs(b)))
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>Every real solution with ω &gt;= 0 and finite p, ordered by p then ω, duplicates merged.</summary>
    internal static List<Solution> Solutions(AffineSplit split)
    {
        double unit = LocusGainUnit.Of(split);
        var found = new List<Solution>();
        if (Math.Max(split.A.Degree, split.B.Degree) < 1)
        {
            return found;
        }

        if (split.B[0] != 0.0)
        {
            double p = split.A[0] == 0.0 ? 0.0 : -split.A[0] / split.B[0];
            found.Add(Describe(split, 0.0, p, split.A[0] == 0.0));
        }

        double omegaUnit = Math.Max(TraceScale.LargestRoot(split.A), TraceScale.LargestRoot(split.B));
        foreach (double omega in SquaredFrequencies(split, omegaUnit))
        {
            if (Polish(split, omega, unit) is { } solution)
            {
                found.Add(solution);
            }
        }

        return Deduplicate(found, unit, omegaUnit);
    }

    /// <summary>Starting ω &gt; 0 from the real non-negative roots of Q(x), x = ω².</summary>
    private static IEnumerable<double> SquaredFrequencies(AffineSplit split, double omegaUnit)
    {
        var (ae, ao) = Split(split.A);
        var (be, bo) = Split(split.B);
        var w = (ao * be) - (ae * bo);
        var q = new double[(w.Degree / 2) + 1];
        for (int j = 0; j < q.Length; j++)
        {
            q[j] = w[(2 * j) + 1];
        }

        var qPoly = Polynomial.FromAscending(q);
        if (qPoly.Degree < 1)
        {
            yield break;
        }

        double x2 = Math.Max(omegaUnit * omegaUnit, 1e-300);
        foreach (var x in PolynomialRoots.Find(qPoly))
        {
            if (Math.Abs(x.Imaginary) <= RealRootTolerance * Math.Max(x.Magnitude, x2) && x.Real > 0.0)
            {
                yield return Math.Sqrt(x.Real);
            }
        }
    }

    /// <summary>P(jω) = E(ω) + j·O(ω): the even and odd real polynomials in ω.</summary>
    private static (Polynomial Even, Polynomial Odd) Split(Polynomial p)
    {
        var even = new double[p.Degree + 1];
        var odd = new double[p.Degree + 1];
        for (int k = 0; k <= p.Degree; k++)
        {
            double sign = (k / 2) % 2 == 0 ? 1.0 : -1.0;
            (k % 2 == 0 ? even : odd)[k] = sign * p[k];
        }

        return (Polynomial.FromAscending(even), Polynomial.FromAscending(odd));
    }

    /// <summary>Newton's method on (ω, p); null when the point is not a true crossing (B(jω) = 0 or residual large).</summary>
    private static Solution? Polish(AffineSplit split, double omega, double unit)
    {
        var s = new Complex(0.0, omega);
        var b = split.B.Evaluate(s);
        if (b.Magnitude <= LocusMagnitude.RoundingBound(split.B, s))
        {
            return null;
        }

        double p = (-split.A.Evaluate(s) / b).Real;
        var dA = split.A.Derivative();
        var dB = split.B.Derivative();
        for (int i = 0; i < NewtonIterations; i++)
        {
            s = new Complex(0.0, omega);
            var f = split.A.Evaluate(s) + (p * split.B.Evaluate(s));
            var byOmega = Complex.ImaginaryOne * (dA.Evaluate(s) + (p * dB.Evaluate(s)));
            var byValue = split.B.Evaluate(s);
            double det = (byOmega.Real * byValue.Imaginary) - (byValue.Real * byOmega.Imaginary);
            if (det == 0.0 || !double.IsFinite(det))
            {
                break;
            }

            double dOmega = -((f.Real * byValue.Imaginary) - (byValue.Real * f.Imaginary)) / det;
            double dValue = -((byOmega.Real * f.Imaginary) - (f.Real * byOmega.Imaginary)) / det;
            omega += dOmega;
            p += dValue;
            if (Math.Abs(dOmega) <= 1e-16 * Math.Abs(omega) && Math.Abs(dValue) <= 1e-16 * Math.Max(Math.Abs(p), unit))
            {
                break;
            }
        }

        return Accept(split, Math.Abs(omega), p, unit);
    }

    private static Solution? Accept(AffineSplit split, double omega, double p, double unit)
    {
        var s = new Complex(0.0, omega);
        var a = split.A.Evaluate(s);
        var pb = p * split.B.Evaluate(s);
        double residual = (a + pb).Magnitude;
        if (!double.IsFinite(p) || residual > ResidualTolerance * (a.Magnitude + pb.Magnitude))
        {
            return null;
        }

        bool openLoopPole = a.Magnitude <= LocusMagnitude.RoundingBound(split.A, s) * 1e3
            || Math.Abs(p) <= 1e-12 * unit;
        return Describe(split, omega, openLoopPole ? 0.0 : p, openLoopPole);
    }

    /// <summary>The crossing's direction from ds/dp = −B(s)/P'(s) at s = jω.</summary>
    private static Solution Describe(AffineSplit split, double omega, double p, bool openLoopPole)
    {
        var s = new Complex(0.0, omega);
        var slope = split.A.Derivative().Evaluate(s) + (p * split.B.Derivative().Evaluate(s));
        var velocity = -split.B.Evaluate(s) / slope;
        var direction = !double.IsFinite(velocity.Real) || Math.Abs(velocity.Real) <= 1e-9 * velocity.Magnitude
            ? AxisCrossingDirection.Touching
            : velocity.Real > 0 ? AxisCrossingDirection.IntoRightHalfPlane : AxisCrossingDirection.IntoLeftHalfPlane;
        return new Solution(omega, p, openLoopPole, direction);
    }

    private static List<Solution> Deduplicate(List<Solution> found, double unit, double omegaUnit)
    {
        var ordered = found.OrderBy(x => x.Value).ThenBy(x => x.Omega).ToList();
        var kept = new List<Solution>();
        foreach (var x in ordered)
        {
            if (kept.Count > 0 && Close(kept[^1], x, unit, omegaUnit))
            {
                continue;
            }

            kept.Add(x);
        }

        return kept;
    }

    private static bool Close(Solution a, Solution b, double unit, double omegaUnit) =>
        Math.Abs(a.Value - b.Value) <= 1e-9 * Math.Max(Math.Abs(a.Value), unit * 1e-3)
        && Math.Abs(a.Omega - b.Omega) <= 1e-9 * Math.Max(a.Omega, Math.Max(omegaUnit, 1e-300));
}
