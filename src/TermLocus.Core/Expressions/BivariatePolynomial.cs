using TermLocus.Core.Algebra;

namespace TermLocus.Core.Expressions;

/// <summary>
/// A polynomial in the variable s whose coefficients are polynomials in the swept parameter p:
/// <c>Σ_k c_k(p)·s^k</c>, ascending in both. Immutable; the highest s-power's coefficient is never the zero polynomial.
/// Used to decide exactly whether a characteristic polynomial is affine in p.
/// </summary>
internal sealed class BivariatePolynomial
{
    private readonly Polynomial[] bySPower;

    private BivariatePolynomial(Polynomial[] bySPower)
    {
        int n = bySPower.Length;
        while (n > 0 && bySPower[n - 1].IsZero)
        {
            n--;
        }

        this.bySPower = n == bySPower.Length ? bySPower : bySPower[..n];
    }

    public static BivariatePolynomial One { get; } = new([Polynomial.One]);

    /// <summary>The swept parameter p itself.</summary>
    public static BivariatePolynomial SweptParameter { get; } = new([Polynomial.X]);

    /// <summary>The variable s itself.</summary>
    public static BivariatePolynomial Variable { get; } = new([Polynomial.Zero, Polynomial.One]);

    public bool IsZero => bySPower.Length == 0;

    /// <summary>Highest power of p in any coefficient; -1 for zero.</summary>
    public int DegreeInP => bySPower.Length == 0 ? -1 : bySPower.Max(c => c.Degree);

    /// <summary>True when the value is a number: free of both s and p.</summary>
    public bool IsConstant => bySPower.Length == 0 || (bySPower.Length == 1 && bySPower[0].Degree <= 0);

    /// <summary>The number, for a constant.</summary>
    public double ConstantValue => bySPower.Length == 0 ? 0.0 : bySPower[0][0];

    /// <summary>The largest m such that p^m divides every coefficient exactly; 0 for zero.</summary>
    public int CommonPowerOfP()
    {
        int m = int.MaxValue;
        foreach (var c in bySPower)
        {
            int low = 0;
            while (low < c.Coefficients.Length && c.Coefficients[low] == 0.0)
            {
                low++;
            }

            if (!c.IsZero)
            {
                m = Math.Min(m, low);
            }
        }

        return m == int.MaxValue ? 0 : m;
    }

    /// <summary>This polynomial divided by p^m, where p^m divides every coefficient (see <see cref="CommonPowerOfP"/>).</summary>
    public BivariatePolynomial DivideByPowerOfP(int m) =>
        m == 0 ? this : new(bySPower.Select(c => c.IsZero ? c : Polynomial.FromAscending(c.Coefficients.AsSpan()[m..])).ToArray());

    public static BivariatePolynomial Constant(double c) => new([Polynomial.Constant(c)]);

    /// <summary>The coefficient of p^j, as a polynomial in s (ascending).</summary>
    public Polynomial CoefficientOfP(int j)
    {
        var c = new double[bySPower.Length];
        for (int k = 0; k < c.Length; k++)
        {
            c[k] = bySPower[k][j];
        }

        return Polynomial.FromAscending(c);
    }

    public bool AllFinite() =>
        bySPower.All(c => c.Coefficients.All(double.IsFinite));

    public static BivariatePolynomial operator +(BivariatePolynomial a, BivariatePolynomial b) => Combine(a, b, 1.0);

    public static BivariatePolynomial operator -(BivariatePolynomial a, BivariatePolynomial b) => Combine(a, b, -1.0);

    public static BivariatePolynomial operator -(BivariatePolynomial a) =>
        new(a.bySPower.Select(c => -c).ToArray());

    public static BivariatePolynomial operator *(BivariatePolynomial a, BivariatePolynomial b)
    {
        if (a.IsZero || b.IsZero)
        {
            return new([]);
        }

        var c = new Polynomial[a.bySPower.Length + b.bySPower.Length - 1];
        Array.Fill(c, Polynomial.Zero);
        for (int i = 0; i < a.bySPower.Length; i++)
        {
            for (int j = 0; j < b.bySPower.Length; j++)
            {
                c[i + j] += a.bySPower[i] * b.bySPower[j];
            }
        }

        return new(c);
    }

    public BivariatePolynomial Pow(int exponent)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(exponent);
        BivariatePolynomial result = One, b = this;
        while (exponent > 0)
        {
            if ((exponent & 1) == 1)
            {
                result *= b;
            }

            exponent >>= 1;
            if (exponent > 0)
            {
                b *= b;
            }
        }

        return result;
    }

    private static BivariatePolynomial Combine(BivariatePolynomial a, BivariatePolynomial b, double sign)
    {
        var c = new Polynomial[Math.Max(a.bySPower.Length, b.bySPower.Length)];
        for (int k = 0; k < c.Length; k++)
        {
            var ak = k < a.bySPower.Length ? a.bySPower[k] : Polynomial.Zero;
            var bk = k < b.bySPower.Length ? b.bySPower[k] : Polynomial.Zero;
            c[k] = sign > 0 ? ak + bk : ak - bk;
        }

        return new(c);
    }
}
