using System.Numerics;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Refines a full set of root estimates of a polynomial at once by the Aberth–Ehrlich iteration, warm-started from
/// the roots at a nearby parameter value. A warm start converges in a few sweeps, far cheaper than a fresh
/// eigenvalue solve; when it does not converge the caller falls back to the eigenvalue solver.
/// </summary>
internal static class TraceRootRefiner
{
    private const int MaxSweeps = 60;

    /// <summary>A correction below this share of |z| counts as converged.</summary>
    private const double StepTolerance = 4e-15;

    /// <summary>Starting points are nudged apart by this share of the scale, off the real axis, so that coincident
    /// or real-only starts can still split into complex pairs.</summary>
    private const double StartNudge = 1e-9;

    /// <summary>Sum of the roots must match Vieta's value to this share of Σ|z|, catching a lost or doubled root.</summary>
    private const double VietaTolerance = 1e-7;

    private const double GoldenAngle = 2.399963229728653;

    private const double MachineEpsilon = 2.220446049250313e-16;

    /// <summary>|P(z)| within this many rounding units of Σ|c_k||z|^k cannot be reduced further: z is a root as far
    /// as double precision can tell.</summary>
    private const double RoundingFactor = 4.0;

    /// <summary>
    /// Refines <paramref name="z"/> in place to the roots of the polynomial with ascending coefficients
    /// <paramref name="c"/> (degree z.Length, leading coefficient non-zero). Returns false when the iteration did
    /// not converge or produced non-finite values; z is then unspecified.
    /// </summary>
    internal static bool TryRefine(ReadOnlySpan<double> c, Span<Complex> z, double scale)
    {
        int n = z.Length;
        if (n == 0)
        {
            return true;
        }

        for (int i = 0; i < n; i++)
        {
            double r = StartNudge * Math.Max(scale, z[i].Magnitude);
            z[i] += Complex.FromPolarCoordinates(r, GoldenAngle * (i + 1));
        }

        Span<bool> done = n <= 64 ? stackalloc bool[n] : new bool[n];
        for (int sweep = 0; sweep < MaxSweeps; sweep++)
        {
            if (Sweep(c, z, done))
            {
                return IsFinite(z) && SumMatchesVieta(c, z);
            }
        }

        return false;
    }

    /// <summary>One Gauss–Seidel sweep; true when every root had converged.</summary>
    private static bool Sweep(ReadOnlySpan<double> c, Span<Complex> z, Span<bool> done)
    {
        bool allDone = true;
        int n = z.Length;
        for (int i = 0; i < n; i++)
        {
            if (done[i])
            {
                continue;
            }

            allDone = false;
            var zi = z[i];
            Evaluate(c, zi, out var value, out var slope, out double bound);
            if (value.Magnitude <= RoundingFactor * n * MachineEpsilon * bound)
            {
                done[i] = true;
                continue;
            }

            var ratio = value / slope;
            Complex repulsion = Complex.Zero;
            for (int j = 0; j < n; j++)
            {
                if (j != i)
                {
                    repulsion += Complex.One / (zi - z[j]);
                }
            }

            var step = ratio / (Complex.One - ratio * repulsion);
            z[i] = zi - step;
            if (step.Magnitude <= StepTolerance * z[i].Magnitude || !double.IsFinite(step.Real))
            {
                done[i] = true;
            }
        }

        return allDone;
    }

    /// <summary>P(z), P'(z) by Horner, and Σ|c_k||z|^k, the scale of rounding error in P(z).</summary>
    private static void Evaluate(ReadOnlySpan<double> c, Complex z, out Complex value, out Complex slope, out double bound)
    {
        int n = c.Length - 1;
        Complex p = c[n];
        Complex dp = Complex.Zero;
        double az = z.Magnitude;
        double b = Math.Abs(c[n]);
        for (int k = n - 1; k >= 0; k--)
        {
            dp = dp * z + p;
            p = p * z + c[k];
            b = b * az + Math.Abs(c[k]);
        }

        value = p;
        slope = dp;
        bound = b;
    }

    private static bool IsFinite(ReadOnlySpan<Complex> z)
    {
        foreach (var v in z)
        {
            if (!double.IsFinite(v.Real) || !double.IsFinite(v.Imaginary))
            {
                return false;
            }
        }

        return true;
    }

    private static bool SumMatchesVieta(ReadOnlySpan<double> c, ReadOnlySpan<Complex> z)
    {
        int n = c.Length - 1;
        Complex sum = Complex.Zero;
        double size = 0.0;
        foreach (var v in z)
        {
            sum += v;
            size += v.Magnitude;
        }

        double expected = -c[n - 1] / c[n];
        return Complex.Abs(sum - expected) <= VietaTolerance * Math.Max(size, MachineEpsilon);
    }
}
