using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// Evaluates P(s; p)'s coefficients into a reusable buffer. Affine families are evaluated as A + p·B without
/// building a polynomial object, which keeps the tracer's inner loop free of allocation.
/// </summary>
internal sealed class TraceCoefficients(CharacteristicFamily family)
{
    private readonly AffineSplit? split = family.Affine;

    /// <summary>The family evaluated.</summary>
    internal CharacteristicFamily Family => family;

    /// <summary>
    /// Writes P(s; p)'s ascending coefficients into <paramref name="buffer"/> (zeros above the degree) and returns
    /// the degree, -1 for the zero polynomial, or int.MaxValue when the polynomial does not fit the buffer.
    /// </summary>
    internal int Fill(double p, double[] buffer)
    {
        if (split is { } s)
        {
            int degree = -1;
            for (int k = 0; k < buffer.Length; k++)
            {
                buffer[k] = s.A[k] + (p * s.B[k]);
                if (buffer[k] != 0.0)
                {
                    degree = k;
                }
            }

            return degree;
        }

        var poly = family.At(p);
        if (poly.Coefficients.Length > buffer.Length)
        {
            return int.MaxValue;
        }

        Array.Clear(buffer);
        poly.Coefficients.AsSpan().CopyTo(buffer);
        return poly.Degree;
    }

    /// <summary>P(s; p) as a polynomial.</summary>
    internal Polynomial At(double p) => family.At(p);
}
