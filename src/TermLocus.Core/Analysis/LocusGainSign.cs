namespace TermLocus.Core.Analysis;

/// <summary>
/// The sign of the swept value p a construction fact applies to. The textbook 180° rules hold where
/// p·lead(B)/lead(A) &gt; 0 (the usual negative-feedback locus), the 0° rules where it is negative.
/// </summary>
public enum LocusGainSign
{
    /// <summary>p &gt; 0.</summary>
    Positive,

    /// <summary>p &lt; 0.</summary>
    Negative,
}
