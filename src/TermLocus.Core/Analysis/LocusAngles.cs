namespace TermLocus.Core.Analysis;

/// <summary>Angle helpers in degrees.</summary>
internal static class LocusAngles
{
    /// <summary>An angle in degrees brought into (-180, 180].</summary>
    internal static double Normalize(double degrees)
    {
        double a = Math.IEEERemainder(degrees, 360.0);
        if (a <= -180.0)
        {
            a += 360.0;
        }
        else if (a > 180.0)
        {
            a -= 360.0;
        }

        // Rounding can leave -180 as -179.99999999999997 or 180 as 180.00000000000003; snap the last bits.
        return Math.Abs(Math.Abs(a) - 180.0) <= 1e-12 ? 180.0 : a;
    }

    /// <summary>The signs of p present in [from, to]: Positive when to &gt; 0, Negative when from &lt; 0.</summary>
    internal static IEnumerable<LocusGainSign> SignsIn(double from, double to)
    {
        if (to > 0.0)
        {
            yield return LocusGainSign.Positive;
        }

        if (from < 0.0)
        {
            yield return LocusGainSign.Negative;
        }
    }

    /// <summary>True when the 180° rules apply for this sign of p: p·lead(B)/lead(A) &gt; 0.</summary>
    internal static bool Uses180Degrees(AffineSplit split, LocusGainSign sign) =>
        (sign == LocusGainSign.Positive) == (split.B.Leading / split.A.Leading > 0.0);
}
