namespace TermLocus.Core.Analysis;

/// <summary>Brent's method (inverse quadratic interpolation safeguarded by bisection) for a bracketed sign change.</summary>
internal static class LocusBrent
{
    private const int MaxIterations = 200;
    private const double MachineEpsilon = 2.220446049250313e-16;

    /// <summary>
    /// A value in [a, b] where continuous <paramref name="f"/> changes sign, given fa = f(a) and fb = f(b) of
    /// opposite signs (or one zero), to within 2·eps·|x| + <paramref name="absoluteTolerance"/>.
    /// </summary>
    internal static double Solve(Func<double, double> f, double a, double b, double fa, double fb, double absoluteTolerance)
    {
        if (fa == 0.0)
        {
            return a;
        }

        if (fb == 0.0)
        {
            return b;
        }

        double c = a, fc = fa, d = b - a, e = d;
        for (int i = 0; i < MaxIterations; i++)
        {
            if (Math.Sign(fb) == Math.Sign(fc))
            {
                (c, fc) = (a, fa);
                d = e = b - a;
            }

            if (Math.Abs(fc) < Math.Abs(fb))
            {
                (a, fa, b, fb, c, fc) = (b, fb, c, fc, b, fb);
            }

            double tol = (2.0 * MachineEpsilon * Math.Abs(b)) + (0.5 * absoluteTolerance);
            double m = 0.5 * (c - b);
            if (Math.Abs(m) <= tol || fb == 0.0)
            {
                return b;
            }

            (d, e) = NextStep(a, b, c, fa, fb, fc, d, e, m, tol);
            (a, fa) = (b, fb);
            b += Math.Abs(d) > tol ? d : (m > 0 ? tol : -tol);
            fb = f(b);
        }

        return b;
    }

    /// <summary>Chooses interpolation when it stays well inside the bracket, bisection otherwise.</summary>
    private static (double D, double E) NextStep(
        double a, double b, double c, double fa, double fb, double fc, double d, double e, double m, double tol)
    {
        if (Math.Abs(e) < tol || Math.Abs(fa) <= Math.Abs(fb))
        {
            return (m, m);
        }

        double s = fb / fa, p, q;
        if (a == c)
        {
            p = 2.0 * m * s;
            q = 1.0 - s;
        }
        else
        {
            double qa = fa / fc, r = fb / fc;
            p = s * ((2.0 * m * qa * (qa - r)) - ((b - a) * (r - 1.0)));
            q = (qa - 1.0) * (r - 1.0) * (s - 1.0);
        }

        if (p > 0)
        {
            q = -q;
        }
        else
        {
            p = -p;
        }

        return 2.0 * p < Math.Min((3.0 * m * q) - Math.Abs(tol * q), Math.Abs(e * q)) ? (p / q, d) : (m, m);
    }
}
