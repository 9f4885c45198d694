namespace TermLocus.Core.Analysis;

/// <summary>
/// The warped parameter u = asinh(p / unit) in which the tracer samples evenly: near-logarithmic for |p| much larger
/// than the unit, linear through zero, so wide ranges and ranges that include zero or negative values are both
/// sampled densely where poles move fastest (near the open-loop poles).
/// </summary>
internal readonly record struct TraceParameterWarp(double Unit)
{
    /// <summary>Share of the range's largest magnitude below which sampling is even in p.</summary>
    private const double LinearShare = 1e-3;

    internal static TraceParameterWarp For(double from, double to) =>
        new(Math.Max(Math.Abs(from), Math.Abs(to)) * LinearShare);

    internal double ToWarped(double p) => Math.Asinh(p / Unit);

    internal double ToValue(double u) => Unit * Math.Sinh(u);
}
