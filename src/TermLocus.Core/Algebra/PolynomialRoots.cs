using System.Diagnostics.CodeAnalysis;
using System.Numerics;
using System.Runtime.InteropServices;

namespace TermLocus.Core.Algebra;

/// <summary>
/// Roots of real polynomials. Method: exact roots at the origin are split off; the variable is scaled by a power
/// of two, s = 2^e·t, so the constant and leading terms match (geometric mean of the root magnitudes), which keeps
/// coefficient spans like 1e-9..1e9 harmless; degree 1 and 2 use closed forms, higher degrees the eigenvalues of
/// the Parlett–Reinsch-balanced companion matrix by the Francis double-shift QR (MathNet's general solver as a
/// fallback); every root is then Newton-polished on the original coefficients (kept only when its backward error
/// drops), and complex roots are mirrored into exactly conjugate pairs.
/// </summary>
/// <remarks>
/// Accuracy: the backward error of each root (see <see cref="BackwardError"/>) is near the rounding unit,
/// typically below 1e-14, for degrees up to about 40. The forward error is that times the root's condition
/// number: a root of multiplicity k moves by about (ε·scale)^(1/k), e.g. about 1e-2 for (s+1)^8, while the mean of
/// the cluster stays accurate. The Wilkinson polynomial Π(s - i), i = 1..20, is the classic warning: its
/// coefficients cannot even be stored exactly in doubles, and the stored polynomial's roots between 10 and 20 differ
/// from the integers by up to about 0.03; the roots returned are nevertheless exact roots of a polynomial within a
/// few rounding units of the stored one. Roots spread over more decades than a double resolves at once (say 1e-12
/// and 1e12 in one polynomial) get repair rounds, see <see cref="RootFindingOptions.RepairBackwardError"/>.
/// Speed: roughly cubic in the degree (the QR iteration); no allocation besides the result array, none at all in the
/// span form of <see cref="TryFind(ReadOnlySpan{double}, Span{Complex}, RootFindingOptions, out int)"/>.
/// Range: roots past the double range, and roots spread so widely (hundreds of decades, e.g. -s^5 + 5e184·s^2 +
/// 6e-277) that the scaled companion matrix overflows, are not found: Find throws, TryFind returns false.
/// </remarks>
public static class PolynomialRoots
{
    private const string NotSolvedMessage =
        "The roots could not be computed: the companion-matrix eigenvalue iteration did not converge, or a root lies beyond the range of double.";

    /// <summary>
    /// All <c>p.Degree</c> roots of <paramref name="p"/>, sorted by real part then imaginary part; complex roots in
    /// exactly conjugate pairs, real roots with imaginary part exactly 0, roots at the origin exactly 0.
    /// Huge roots from a leading coefficient that is mere rounding noise are returned as they are; use
    /// <see cref="FindWithInfinite(Polynomial)"/> to report those as roots at infinity.
    /// </summary>
    /// <exception cref="ArgumentException">The zero polynomial, or a coefficient that is not finite.</exception>
    /// <exception cref="ArithmeticException">The eigenvalue iteration did not converge (not seen in practice), or a root
    /// lies beyond the range of double (a leading coefficient negligible next to the others, e.g. 1e-310·s + 1).</exception>
    public static Complex[] Find(Polynomial p) => Find(p, RootFindingOptions.Default);

    /// <summary>As <see cref="Find(Polynomial)"/>, with explicit tolerances and limits.</summary>
    /// <exception cref="ArgumentException">The zero polynomial, or a coefficient that is not finite.</exception>
    /// <exception cref="ArithmeticException">The eigenvalue iteration did not converge, or a root lies beyond the range of double.</exception>
    public static Complex[] Find(Polynomial p, RootFindingOptions options)
    {
        ThrowIfUnsolvable(p);
        return TryFind(p, options, out var roots)
            ? roots
            : throw new ArithmeticException(NotSolvedMessage);
    }

    /// <summary>As <see cref="Find(Polynomial)"/>, but returns false (roots empty) instead of throwing.</summary>
    public static bool TryFind(Polynomial p, out Complex[] roots) => TryFind(p, RootFindingOptions.Default, out roots);

    /// <summary>As <see cref="Find(Polynomial, RootFindingOptions)"/>, but returns false (roots empty) instead of throwing.</summary>
    public static bool TryFind(Polynomial p, RootFindingOptions options, out Complex[] roots)
    {
        ArgumentNullException.ThrowIfNull(p);
        roots = p.Degree > 0 ? new Complex[p.Degree] : [];
        if (!TryFind(p.Coefficients.AsSpan(), roots, options, out _))
        {
            roots = [];
            return false;
        }

        return true;
    }

    /// <summary>
    /// Allocation-free form for hot loops: the roots of the polynomial with ascending coefficients
    /// <paramref name="ascending"/> (trailing zeros ignored) go into the front of <paramref name="destination"/>,
    /// which needs room for the degree; <paramref name="rootCount"/> is the degree. Returns false for the zero
    /// polynomial, a non-finite coefficient, too small a destination, no convergence, or a root beyond the range of double.
    /// </summary>
    public static bool TryFind(
        ReadOnlySpan<double> ascending, Span<Complex> destination, RootFindingOptions options, out int rootCount)
    {
        ArgumentNullException.ThrowIfNull(options);
        options.Validate();
        rootCount = 0;
        int n = TrimmedLength(ascending) - 1;
        if (n < 0 || destination.Length < n || !AllFinite(ascending[..(n + 1)]))
        {
            return false;
        }

        if (!TrySolve(ascending[..(n + 1)], destination, options, detectInfinite: false, out rootCount, out _))
        {
            rootCount = 0;
            return false;
        }

        return true;
    }

    /// <summary>
    /// The finite roots of <paramref name="p"/>, plus the count of roots at infinity when its leading coefficients
    /// vanish relative to the rest (see <see cref="RootFindingOptions.InfiniteRootRelativeTolerance"/>). The finite
    /// roots are found on the polynomial without the vanished terms and then polished on the whole of it.
    /// </summary>
    /// <exception cref="ArgumentException">The zero polynomial, or a coefficient that is not finite.</exception>
    /// <exception cref="ArithmeticException">The eigenvalue iteration did not converge, or a root lies beyond the range of double.</exception>
    public static RootSet FindWithInfinite(Polynomial p) => FindWithInfinite(p, RootFindingOptions.Default);

    /// <summary>As <see cref="FindWithInfinite(Polynomial)"/>, with explicit tolerances and limits.</summary>
    /// <exception cref="ArgumentException">The zero polynomial, or a coefficient that is not finite.</exception>
    /// <exception cref="ArithmeticException">The eigenvalue iteration did not converge, or a root lies beyond the range of double.</exception>
    public static RootSet FindWithInfinite(Polynomial p, RootFindingOptions options)
    {
        ThrowIfUnsolvable(p);
        return TryFindWithInfinite(p, options, out var roots)
            ? roots
            : throw new ArithmeticException(NotSolvedMessage);
    }

    /// <summary>As <see cref="FindWithInfinite(Polynomial, RootFindingOptions)"/>, but returns false (null) instead of throwing.</summary>
    public static bool TryFindWithInfinite(Polynomial p, RootFindingOptions options, [NotNullWhen(true)] out RootSet? roots)
    {
        ArgumentNullException.ThrowIfNull(p);
        ArgumentNullException.ThrowIfNull(options);
        options.Validate();
        roots = null;
        var coefficients = p.Coefficients.AsSpan();
        if (p.IsZero || !AllFinite(coefficients))
        {
            return false;
        }

        var buffer = new Complex[p.Degree];
        if (!TrySolve(coefficients, buffer, options, detectInfinite: true, out int finite, out int infinite))
        {
            return false;
        }

        Array.Resize(ref buffer, finite);
        roots = new RootSet(ImmutableCollectionsMarshal.AsImmutableArray(buffer), infinite);
        return true;
    }

    /// <summary>
    /// The componentwise backward error of <paramref name="root"/> as a root of <paramref name="p"/>:
    /// |p(s)| / Σ|a_k|·|s|^k, the smallest relative change of the coefficients that makes it an exact root
    /// (dimensionless, &gt;= 0; 1 for a non-zero constant; 0 for s = 0 when a_0 = 0). Non-finite for a non-finite root.
    /// </summary>
    /// <exception cref="ArgumentException">The zero polynomial.</exception>
    public static double BackwardError(Polynomial p, Complex root)
    {
        ArgumentNullException.ThrowIfNull(p);
        if (p.IsZero)
        {
            throw new ArgumentException("The zero polynomial has no isolated roots.", nameof(p));
        }

        return RootPolisher.BackwardError(p.Coefficients.AsSpan(), root.Real, root.Imaginary);
    }

    private static void ThrowIfUnsolvable(Polynomial p)
    {
        ArgumentNullException.ThrowIfNull(p);
        if (p.IsZero)
        {
            throw new ArgumentException("The zero polynomial has no isolated roots.", nameof(p));
        }

        if (!AllFinite(p.Coefficients.AsSpan()))
        {
            throw new ArgumentException("Every coefficient must be finite.", nameof(p));
        }
    }

    private static bool TrySolve(
        ReadOnlySpan<double> a, Span<Complex> destination, RootFindingOptions options, bool detectInfinite,
        out int finiteCount, out int infiniteCount)
    {
        int zeros = 0;
        while (a[zeros] == 0.0)
        {
            zeros++;
        }

        var q = a[zeros..];
        infiniteCount = detectInfinite ? VanishingLeadingTerms.Count(q, options.InfiniteRootRelativeTolerance) : 0;
        int nonZeroRoots = q.Length - 1 - infiniteCount;
        finiteCount = zeros + nonZeroRoots;
        destination[..zeros].Clear();
        if (nonZeroRoots > 0
            && !NonZeroRoots.TrySolve(q[..(nonZeroRoots + 1)], q, destination.Slice(zeros, nonZeroRoots), options))
        {
            return false;
        }

        // Roots past the double range come back as infinities or NaN; no caller can use them, so fail instead.
        foreach (var root in destination[..finiteCount])
        {
            if (!double.IsFinite(root.Real) || !double.IsFinite(root.Imaginary))
            {
                return false;
            }
        }

        SortByRealThenImaginary(destination[..finiteCount]);
        return true;
    }

    private static int TrimmedLength(ReadOnlySpan<double> ascending)
    {
        int n = ascending.Length;
        while (n > 0 && ascending[n - 1] == 0.0)
        {
            n--;
        }

        return n;
    }

    private static bool AllFinite(ReadOnlySpan<double> values)
    {
        foreach (double v in values)
        {
            if (!double.IsFinite(v))
            {
                return false;
            }
        }

        return true;
    }

    private static void SortByRealThenImaginary(Span<Complex> roots)
    {
        for (int i = 1; i < roots.Length; i++)
        {
            var x = roots[i];
            int j = i - 1;
            while (j >= 0 && (roots[j].Real > x.Real || (roots[j].Real == x.Real && roots[j].Imaginary > x.Imaginary)))
            {
                roots[j + 1] = roots[j];
                j--;
            }

            roots[j + 1] = x;
        }
    }
}
