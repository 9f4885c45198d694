using System.Numerics;
using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// How fast a closed-loop pole moves with the swept parameter: for a simple root s0 of P(s; p), implicit
/// differentiation of P(s(p); p) = 0 gives ds/dp = -(∂P/∂p)(s0) / (∂P/∂s)(s0), in rad/s per unit of p.
/// At a multiple root ∂P/∂s vanishes and the pole moves like a fractional power of the parameter change, so no
/// derivative exists; the Try forms then return false instead of a huge number.
/// </summary>
public static class PoleSensitivity
{
    /// <summary>
    /// A root counts as multiple when |P'(s0)| is at most this fraction of its rounding scale Σ k|a_k||s0|^(k-1)
    /// (1e-8: about the distance, relative, at which two roots of a double-root pair are still told apart).
    /// </summary>
    public const double DefaultMultipleRootTolerance = 1e-8;

    /// <summary>
    /// ds/dp at <paramref name="root"/> of <paramref name="characteristic"/>, given ∂P/∂p as the polynomial
    /// <paramref name="parameterDerivative"/> (for P = A + p·B that is B). False (sensitivity 0) near a multiple root.
    /// </summary>
    /// <exception cref="ArgumentException">The root is not finite, or the characteristic polynomial is constant.</exception>
    public static bool TryCompute(Polynomial characteristic, Polynomial parameterDerivative, Complex root, out Complex sensitivity) =>
        TryCompute(characteristic, parameterDerivative, root, DefaultMultipleRootTolerance, out sensitivity);

    /// <summary>As <see cref="TryCompute(Polynomial, Polynomial, Complex, out Complex)"/> with an explicit tolerance in [0, 1).</summary>
    /// <exception cref="ArgumentException">The root is not finite, or the characteristic polynomial is constant.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The tolerance is out of range.</exception>
    public static bool TryCompute(
        Polynomial characteristic, Polynomial parameterDerivative, Complex root, double multipleRootTolerance, out Complex sensitivity)
    {
        ArgumentNullException.ThrowIfNull(characteristic);
        ArgumentNullException.ThrowIfNull(parameterDerivative);
        if (!(multipleRootTolerance >= 0.0 && multipleRootTolerance < 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(multipleRootTolerance), multipleRootTolerance, "Must be in [0, 1).");
        }

        if (!double.IsFinite(root.Real) || !double.IsFinite(root.Imaginary) || characteristic.Degree < 1)
        {
            throw new ArgumentException("Needs a finite root of a non-constant polynomial.", nameof(root));
        }

        sensitivity = Complex.Zero;
        var (slope, scale) = DerivativeAndScale(characteristic, root);
        if (!(Complex.Abs(slope) > multipleRootTolerance * scale))
        {
            return false;
        }

        sensitivity = -parameterDerivative.Evaluate(root) / slope;
        return double.IsFinite(sensitivity.Real) && double.IsFinite(sensitivity.Imaginary);
    }

    /// <summary>As <see cref="TryCompute(Polynomial, Polynomial, Complex, out Complex)"/>, throwing near a multiple root.</summary>
    /// <exception cref="ArgumentException">The root is not finite, or the characteristic polynomial is constant.</exception>
    /// <exception cref="InvalidOperationException">The root is (numerically) multiple: no derivative exists.</exception>
    public static Complex Compute(Polynomial characteristic, Polynomial parameterDerivative, Complex root) =>
        TryCompute(characteristic, parameterDerivative, root, out var s)
            ? s
            : throw new InvalidOperationException("The pole sensitivity is undefined at a multiple root.");

    /// <summary>
    /// ds/dp for the pole <paramref name="root"/> of <paramref name="family"/> at swept value <paramref name="parameter"/>,
    /// with ∂P/∂p from <see cref="ParameterDerivative"/>. False near a multiple root.
    /// </summary>
    /// <exception cref="ArgumentException">The root or the parameter is not finite.</exception>
    public static bool TryCompute(CharacteristicFamily family, double parameter, Complex root, out Complex sensitivity)
    {
        ArgumentNullException.ThrowIfNull(family);
        return TryCompute(family.At(parameter), ParameterDerivative(family, parameter), root, out sensitivity);
    }

    /// <summary>
    /// ∂P/∂p as a polynomial in s at swept value <paramref name="parameter"/>: exactly B for an affine family
    /// P = A + p·B; otherwise the central difference (P(p + h) - P(p - h)) / 2h with h = ε^(1/3)·max(|p|, 1)
    /// (about 6e-6 relative), whose error is of order h² times the third derivative plus ε/h, so about 1e-10
    /// relative for smooth families.
    /// </summary>
    /// <exception cref="ArgumentException">The parameter is not finite.</exception>
    public static Polynomial ParameterDerivative(CharacteristicFamily family, double parameter)
    {
        ArgumentNullException.ThrowIfNull(family);
        if (!double.IsFinite(parameter))
        {
            throw new ArgumentException("The parameter must be finite.", nameof(parameter));
        }

        if (family.Affine is { } split)
        {
            return split.B;
        }

        double h = Math.Cbrt(2.220446049250313e-16) * Math.Max(Math.Abs(parameter), 1.0);
        double up = parameter + h, down = parameter - h;
        return (family.At(up) - family.At(down)).Scale(1.0 / (up - down));
    }

    /// <summary>P'(s0) and Σ k|a_k||s0|^(k-1), the size of the terms it is made of.</summary>
    private static (Complex Slope, double Scale) DerivativeAndScale(Polynomial p, Complex s0)
    {
        Complex slope = Complex.Zero;
        double scale = 0.0, r = Complex.Abs(s0);
        for (int k = p.Degree; k >= 1; k--)
        {
            slope = (slope * s0) + (k * p[k]);
            scale = (scale * r) + (k * Math.Abs(p[k]));
        }

        return (slope, scale);
    }
}
