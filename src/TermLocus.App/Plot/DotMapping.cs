using System.Numerics;

namespace TermLocus.App.Plot;

/// <summary>Maps complex numbers inside <see cref="Bounds"/> onto a dot grid of <see cref="DotWidth"/> ×
/// <see cref="DotHeight"/>; the top-left dot holds (MinReal, MaxImaginary).</summary>
internal readonly struct DotMapping
{
    private readonly double dotsPerRealUnit;
    private readonly double dotsPerImaginaryUnit;

    public DotMapping(PlaneRect bounds, int dotWidth, int dotHeight)
    {
        Bounds = bounds;
        DotWidth = dotWidth;
        DotHeight = dotHeight;
        dotsPerRealUnit = dotWidth / bounds.RealSpan;
        dotsPerImaginaryUnit = dotHeight / bounds.ImaginarySpan;
    }

    public PlaneRect Bounds { get; }

    public int DotWidth { get; }

    public int DotHeight { get; }

    /// <summary>The dot column holding real part <paramref name="real"/>, clamped to the grid.</summary>
    public int DotX(double real) => Clamp((real - Bounds.MinReal) * dotsPerRealUnit, DotWidth);

    /// <summary>The dot row holding imaginary part <paramref name="imaginary"/>, clamped to the grid.</summary>
    public int DotY(double imaginary) => Clamp((Bounds.MaxImaginary - imaginary) * dotsPerImaginaryUnit, DotHeight);

    public (int X, int Y) Dot(Complex point) => (DotX(point.Real), DotY(point.Imaginary));

    // Points on the far edge map to one past the last dot; clamping keeps them on the grid.
    private static int Clamp(double position, int size) =>
        position <= 0 ? 0 : position >= size ? size - 1 : (int)position;
}
