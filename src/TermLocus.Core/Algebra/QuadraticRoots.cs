namespace TermLocus.Core.Algebra;

/// <summary>
/// Roots of a·t² + b·t + c with a and c non-zero, by the cancellation-free formula: the larger root from
/// q = -(b + sign(b)·√d)/2 as q/a, the other as c/q. The discriminant d = b² - 4ac is formed with fused
/// multiply-adds so a nearly double root keeps its accuracy (Kahan's remedy, from memory).
/// </summary>
internal static class QuadraticRoots
{
    /// <summary>
    /// Writes the two roots into re/im: a complex pair exactly conjugate (negative imaginary part first),
    /// real roots with im exactly 0.
    /// </summary>
    public static void Solve(double c, double b, double a, Span<double> re, Span<double> im)
    {
        // A common power of two keeps b² and 4ac inside the double range without rounding anything.
        int e = -Math.ILogB(Math.Max(Math.Abs(a), Math.Max(Math.Abs(b), Math.Abs(c))));
        a = Math.ScaleB(a, e);
        b = Math.ScaleB(b, e);
        c = Math.ScaleB(c, e);

        double d = Discriminant(a, b, c);
        if (d >= 0.0)
        {
            double q = -0.5 * (b + Math.CopySign(Math.Sqrt(d), b));
            re[0] = q / a;
            re[1] = c / q;
            im[0] = im[1] = 0.0;
        }
        else
        {
            re[0] = re[1] = -b / (2.0 * a);
            double half = Math.Sqrt(-d) / (2.0 * Math.Abs(a));
            im[0] = -half;
            im[1] = half;
        }
    }

    private static double Discriminant(double a, double b, double c)
    {
        double bb = b * b;
        double ac = a * c;
        double bbError = Math.FusedMultiplyAdd(b, b, -bb);
        double acError = Math.FusedMultiplyAdd(a, c, -ac);
        return (bb - (4.0 * ac)) + (bbError - (4.0 * acError));
    }
}
