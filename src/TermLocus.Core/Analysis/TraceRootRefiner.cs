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

    /// <summary>...or below this share of the scale, so that roots at the origin (where |z| → 0) also converge.</summary>
    private const double StepFloor = 1e-14;

    /// <summary>Starting points are nudged apart by this share of the scale, off the real axis, so that coincident
    /// or real-only starts can still split into complex pairs.</summary>
    private const double StartNudge = 1e-9;

    /// <summary>Allowed error of the roots' sum, in multiples of their summed accuracy estimates.</summary>
    private const double VietaSlack = 10.0;

    /// <summary>Allowed error of the roots' sum as a share of Σ|z|, whatever the estimates say.</summary>
    private const double VietaFloor = 1e-12;

    private const double GoldenAngle = 2.399963229728653;

    private const double MachineEpsilon = 2.220446049250313e-16;

    /// <summary>|P(z)| within this many rounding units of Σ|c_k||z|^k cannot be reduced further: z is a root as far
    /// as double precision can tell.</summary>
    private const double RoundingFactor = 1.0;

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
            if (Sweep(c, z, done, StepFloor * scale))
            {
                return IsFinite(z) && SumMatchesVieta(c, z);
            }
        }

        return false;
    }

    /// <summary>One Gauss–Seidel sweep; true when every root had converged.</summary>
    private static bool Sweep(ReadOnlySpan<double> c, Span<Complex> z, Span<bool> done, double floor)
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
            if (value.Magnitude <= RoundingFactor * MachineEpsilon * bound)
            {
                done[i] = true;
                continue;
            }

            var ratio = value / slope;
            var step = ratio / (Complex.One - (ratio * Repulsion(z, i)));
            z[i] = zi - step;
            if (step.Magnitude <= (StepTolerance * z[i].Magnitude) + floor || !double.IsFinite(step.Real))
            {
                done[i] = true;
            }
        }

        return allDone;
    }

    /// <summary>Σ_{j≠i} 1/(z_i − z_j), with real arithmetic (1/d = conj(d)/|d|²) because it is the inner loop.</summary>
    private static Complex Repulsion(ReadOnlySpan<Complex> z, int i)
    {
        double x = z[i].Real, y = z[i].Imaginary, re = 0.0, im = 0.0;
        for (int j = 0; j < z.Length; j++)
        {
            if (j == i)
            {
                continue;
            }

            double dx = x - z[j].Real, dy = y - z[j].Imaginary;
            double inverse = 1.0 / ((dx * dx) + (dy * dy));
            re += dx * inverse;
            im -= dy * inverse;
        }

        return new Complex(re, im);
    }

    /// <summary>P(z), P'(z) by Horner, and Σ|c_k||z|^k, the scale of rounding error in P(z).</summary>
    private static void Evaluate(ReadOnlySpan<double> c, Complex z, out Complex value, out Complex slope, out double bound)
    {
        int n = c.Length - 1;
        double x = z.Real, y = z.Imaginary, az = z.Magnitude;
        double pr = c[n], pi = 0.0, dr = 0.0, di = 0.0, b = Math.Abs(c[n]);
        for (int k = n - 1; k >= 0; k--)
        {
            (dr, di) = ((dr * x) - (di * y) + pr, (dr * y) + (di * x) + pi);
            (pr, pi) = ((pr * x) - (pi * y) + c[k], (pr * y) + (pi * x));
            b = (b * az) + Math.Abs(c[k]);
        }

        value = new Complex(pr, pi);
        slope = new Complex(dr, di);
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

    /// <summary>
    /// The roots' sum must match Vieta's −c[n−1]/c[n] to within the roots' own accuracy (Σ of their Newton step
    /// sizes, floored at the rounding level). Two estimates on one root with another root missed would be off by
    /// a whole root separation, far more.
    /// </summary>
    private static bool SumMatchesVieta(ReadOnlySpan<double> c, ReadOnlySpan<Complex> z)
    {
        int n = c.Length - 1;
        Complex sum = Complex.Zero;
        double accuracy = 0.0, size = 0.0;
        foreach (var v in z)
        {
            sum += v;
            size += v.Magnitude;
            Evaluate(c, v, out var value, out var slope, out double bound);
            double residual = Math.Max(value.Magnitude, MachineEpsilon * bound);
            accuracy += residual / Math.Max(slope.Magnitude, double.Epsilon);
        }

        double expected = -c[n - 1] / c[n];
        return Complex.Abs(sum - expected) <= (VietaSlack * accuracy) + (VietaFloor * size);
    }
}
