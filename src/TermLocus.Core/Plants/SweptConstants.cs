using TermLocus.Core.Algebra;
using TermLocus.Core.Expressions;

namespace TermLocus.Core.Plants;

/// <summary>Numeric polynomials and fractions carried into the swept algebra, where they are free of p.</summary>
internal static class SweptConstants
{
    /// <summary>p^<paramref name="powerOfP"/>·q(s) as a polynomial in s and p (Horner in s).</summary>
    public static BivariatePolynomial Of(Polynomial q, int powerOfP = 0)
    {
        var result = BivariatePolynomial.Constant(0.0);
        for (int k = q.Degree; k >= 0; k--)
        {
            result = (result * BivariatePolynomial.Variable) + BivariatePolynomial.Constant(q[k]);
        }

        return powerOfP == 0 ? result : result * BivariatePolynomial.SweptParameter.Pow(powerOfP);
    }

    /// <summary>A numeric fraction as a swept one free of p.</summary>
    public static SweptFraction Of(Fraction f) => new(Of(f.Numerator), Of(f.Denominator));
}
