namespace TermLocus.Core.Analysis;

/// <summary>
/// The natural unit of the swept value of an affine family: |lead(A)/lead(B)|·R^(n−m), the gain at which p·B and A
/// are of equal size at radius R, the largest root magnitude of A and B (1 when all sit at the origin).
/// Used to judge "p is zero" and "p is real" without an absolute threshold.
/// </summary>
internal static class LocusGainUnit
{
    internal static double Of(AffineSplit split)
    {
        double r = Math.Max(TraceScale.LargestRoot(split.A), TraceScale.LargestRoot(split.B));
        if (!(r > 0.0))
        {
            r = 1.0;
        }

        double unit = Math.Abs(split.A.Leading / split.B.Leading) * Math.Pow(r, split.A.Degree - split.B.Degree);
        return unit > 0.0 && double.IsFinite(unit) ? unit : 1.0;
    }
}
