using System.Collections.Immutable;
using System.Globalization;
using System.Numerics;
using System.Text;

namespace TermLocus.Core.Algebra;

/// <summary>
/// An immutable polynomial in one variable with real coefficients, stored in ascending order:
/// <c>Coefficients[k]</c> multiplies <c>x^k</c>. This order is used everywhere in TermLocus.
/// Trailing (highest-order) exact zeros are trimmed on construction, so <see cref="Degree"/> is the
/// true degree; the zero polynomial has no coefficients and degree -1.
/// </summary>
public sealed class Polynomial : IEquatable<Polynomial>
{
    /// <summary>The zero polynomial (degree -1).</summary>
    public static readonly Polynomial Zero = new(ImmutableArray<double>.Empty);

    /// <summary>The constant polynomial 1.</summary>
    public static readonly Polynomial One = new(ImmutableArray.Create(1.0));

    /// <summary>The polynomial x (degree 1).</summary>
    public static readonly Polynomial X = new(ImmutableArray.Create(0.0, 1.0));

    private Polynomial(ImmutableArray<double> trimmed) => Coefficients = trimmed;

    /// <summary>Ascending coefficients, highest-order coefficient non-zero (empty for the zero polynomial).</summary>
    public ImmutableArray<double> Coefficients { get; }

    /// <summary>The degree; -1 for the zero polynomial.</summary>
    public int Degree => Coefficients.Length - 1;

    /// <summary>True for the zero polynomial.</summary>
    public bool IsZero => Coefficients.Length == 0;

    /// <summary>The coefficient of <c>x^k</c>; 0 for k above the degree. Throws for negative k.</summary>
    public double this[int k] => k < Coefficients.Length ? Coefficients[k] : 0.0;

    /// <summary>The highest-order coefficient; 0 for the zero polynomial.</summary>
    public double Leading => IsZero ? 0.0 : Coefficients[^1];

    /// <summary>Builds a polynomial from ascending coefficients (a copy is taken; trailing zeros trimmed).</summary>
    public static Polynomial FromAscending(params ReadOnlySpan<double> ascending)
    {
        int n = ascending.Length;
        while (n > 0 && ascending[n - 1] == 0.0)
        {
            n--;
        }

        return n == 0 ? Zero : new Polynomial(ImmutableArray.Create(ascending[..n]));
    }

    /// <summary>Builds a polynomial from descending coefficients (highest order first), as textbooks print them.</summary>
    public static Polynomial FromDescending(params ReadOnlySpan<double> descending)
    {
        var asc = new double[descending.Length];
        for (int i = 0; i < descending.Length; i++)
        {
            asc[i] = descending[descending.Length - 1 - i];
        }

        return FromAscending(asc);
    }

    /// <summary>A constant polynomial.</summary>
    public static Polynomial Constant(double c) => FromAscending(c);

    /// <summary>
    /// The monic real polynomial with the given roots. Complex roots must come with their conjugates
    /// (within 1e-9 relative); the imaginary part of the product is discarded.
    /// </summary>
    public static Polynomial FromRoots(IEnumerable<Complex> roots)
    {
        Complex[] c = [Complex.One];
        foreach (var r in roots)
        {
            var next = new Complex[c.Length + 1];
            for (int k = 0; k < c.Length; k++)
            {
                next[k + 1] += c[k];
                next[k] -= r * c[k];
            }

            c = next;
        }

        return FromAscending(c.Select(z => z.Real).ToArray());
    }

    /// <summary>Value at a real point, by Horner's rule.</summary>
    public double Evaluate(double x)
    {
        double acc = 0.0;
        for (int k = Coefficients.Length - 1; k >= 0; k--)
        {
            acc = acc * x + Coefficients[k];
        }

        return acc;
    }

    /// <summary>Value at a complex point, by Horner's rule.</summary>
    public Complex Evaluate(Complex z)
    {
        Complex acc = Complex.Zero;
        for (int k = Coefficients.Length - 1; k >= 0; k--)
        {
            acc = acc * z + Coefficients[k];
        }

        return acc;
    }

    /// <summary>The first derivative.</summary>
    public Polynomial Derivative()
    {
        if (Coefficients.Length <= 1)
        {
            return Zero;
        }

        var d = new double[Coefficients.Length - 1];
        for (int k = 1; k < Coefficients.Length; k++)
        {
            d[k - 1] = k * Coefficients[k];
        }

        return FromAscending(d);
    }

    /// <summary>This polynomial raised to a non-negative integer power.</summary>
    public Polynomial Pow(int exponent)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(exponent);
        Polynomial result = One, b = this;
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

    /// <summary>The polynomial with every coefficient multiplied by <paramref name="factor"/>.</summary>
    public Polynomial Scale(double factor)
    {
        var c = new double[Coefficients.Length];
        for (int k = 0; k < c.Length; k++)
        {
            c[k] = Coefficients[k] * factor;
        }

        return FromAscending(c);
    }

    /// <summary>Largest absolute coefficient (0 for the zero polynomial).</summary>
    public double MaxAbsCoefficient()
    {
        double m = 0.0;
        foreach (var c in Coefficients)
        {
            m = Math.Max(m, Math.Abs(c));
        }

        return m;
    }

    /// <summary>Sum of two polynomials.</summary>
    public static Polynomial operator +(Polynomial a, Polynomial b)
    {
        var c = new double[Math.Max(a.Coefficients.Length, b.Coefficients.Length)];
        for (int k = 0; k < c.Length; k++)
        {
            c[k] = a[k] + b[k];
        }

        return FromAscending(c);
    }

    /// <summary>Negation.</summary>
    public static Polynomial operator -(Polynomial a) => a.Scale(-1.0);

    /// <summary>Difference of two polynomials.</summary>
    public static Polynomial operator -(Polynomial a, Polynomial b) => a + (-b);

    /// <summary>Product of two polynomials.</summary>
    public static Polynomial operator *(Polynomial a, Polynomial b)
    {
        if (a.IsZero || b.IsZero)
        {
            return Zero;
        }

        var c = new double[a.Coefficients.Length + b.Coefficients.Length - 1];
        for (int i = 0; i < a.Coefficients.Length; i++)
        {
            for (int j = 0; j < b.Coefficients.Length; j++)
            {
                c[i + j] += a.Coefficients[i] * b.Coefficients[j];
            }
        }

        return FromAscending(c);
    }

    /// <summary>Product with a scalar.</summary>
    public static Polynomial operator *(double k, Polynomial a) => a.Scale(k);

    /// <summary>Product with a scalar.</summary>
    public static Polynomial operator *(Polynomial a, double k) => a.Scale(k);

    /// <inheritdoc/>
    public bool Equals(Polynomial? other) =>
        other is not null && Coefficients.AsSpan().SequenceEqual(other.Coefficients.AsSpan());

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as Polynomial);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var h = new HashCode();
        foreach (var c in Coefficients)
        {
            h.Add(c);
        }

        return h.ToHashCode();
    }

    /// <summary>
    /// Text in the plant-file expression language, highest power first, in variable <paramref name="variable"/>,
    /// with round-trip number formatting (invariant culture), e.g. <c>2*s^2 + -3*s + 1</c>.
    /// </summary>
    public string ToString(string variable)
    {
        if (IsZero)
        {
            return "0";
        }

        var sb = new StringBuilder();
        for (int k = Coefficients.Length - 1; k >= 0; k--)
        {
            double c = Coefficients[k];
            if (c == 0.0)
            {
                continue;
            }

            if (sb.Length > 0)
            {
                sb.Append(" + ");
            }

            string num = c.ToString("R", CultureInfo.InvariantCulture);
            sb.Append(k switch
            {
                0 => $"({num})",
                1 => $"({num})*{variable}",
                _ => $"({num})*{variable}^{k}",
            });
        }

        return sb.ToString();
    }

    /// <inheritdoc/>
    public override string ToString() => ToString("s");
}
