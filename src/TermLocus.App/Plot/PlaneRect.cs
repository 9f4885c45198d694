using System.Numerics;

namespace TermLocus.App.Plot;

/// <summary>An axis-aligned rectangle of the complex plane: real parts in [<paramref name="MinReal"/>,
/// <paramref name="MaxReal"/>], imaginary parts in [<paramref name="MinImaginary"/>, <paramref name="MaxImaginary"/>].</summary>
/// <param name="MinReal">Left edge.</param>
/// <param name="MaxReal">Right edge, greater than <paramref name="MinReal"/>.</param>
/// <param name="MinImaginary">Bottom edge.</param>
/// <param name="MaxImaginary">Top edge, greater than <paramref name="MinImaginary"/>.</param>
public readonly record struct PlaneRect(double MinReal, double MaxReal, double MinImaginary, double MaxImaginary)
{
    /// <summary>Width in real units.</summary>
    public double RealSpan => MaxReal - MinReal;

    /// <summary>Height in imaginary units.</summary>
    public double ImaginarySpan => MaxImaginary - MinImaginary;

    /// <summary>True when <paramref name="point"/> lies inside or on the edge.</summary>
    public bool Contains(Complex point) =>
        point.Real >= MinReal && point.Real <= MaxReal && point.Imaginary >= MinImaginary && point.Imaginary <= MaxImaginary;

    /// <summary>The largest distance from the origin to a corner: a ray from the origin this long leaves the rectangle,
    /// so boundary builders can use it as their reach.</summary>
    public double Reach()
    {
        double x = Math.Max(Math.Abs(MinReal), Math.Abs(MaxReal));
        double y = Math.Max(Math.Abs(MinImaginary), Math.Abs(MaxImaginary));
        return Math.Sqrt((x * x) + (y * y));
    }
}
