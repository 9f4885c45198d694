using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>Rounding-error bounds for polynomial values, to tell "zero" from "small".</summary>
internal static class LocusMagnitude
{
    private const double MachineEpsilon = 2.220446049250313e-16;

    /// <summary>Bound on the rounding error of evaluating <paramref name="p"/> at <paramref name="s"/> by Horner's rule:
    /// 4·(n+1)·eps·Σ|c_k||s|^k.</summary>
    internal static double RoundingBound(Polynomial p, Complex s)
    {
        double r = s.Magnitude, acc = 0.0;
        for (int k = p.Degree; k >= 0; k--)
        {
            acc = (acc * r) + Math.Abs(p[k]);
        }

        return 4.0 * (p.Degree + 1) * MachineEpsilon * acc;
    }
}
