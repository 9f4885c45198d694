using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>Newton polishing of single roots, used to bring eigenvalue estimates to full double precision.</summary>
internal static class LocusNewton
{
    private const int MaxIterations = 60;

    /// <summary>A step below this share of |z| ends the iteration.</summary>
    private const double StepTolerance = 1e-16;

    /// <summary>
    /// Polishes a root of <paramref name="p"/> from <paramref name="guess"/> by Newton's method for a root of known
    /// multiplicity (z -= m·P/P'). Stops when the step stops shrinking, so it never walks away from a good estimate.
    /// A real guess stays real (P has real coefficients).
    /// </summary>
    internal static Complex Polish(Polynomial p, Complex guess, int multiplicity = 1)
    {
        var dp = p.Derivative();
        var z = guess;
        double lastStep = double.PositiveInfinity;
        for (int i = 0; i < MaxIterations; i++)
        {
            var slope = dp.Evaluate(z);
            if (slope == Complex.Zero)
            {
                break;
            }

            var step = multiplicity * p.Evaluate(z) / slope;
            double size = step.Magnitude;
            if (!double.IsFinite(size) || size >= lastStep)
            {
                break;
            }

            z -= step;
            lastStep = size;
            if (size <= StepTolerance * z.Magnitude)
            {
                break;
            }
        }

        return z;
    }
}
