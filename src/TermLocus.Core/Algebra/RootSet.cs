using System.Collections.Immutable;
using System.Numerics;

namespace TermLocus.Core.Algebra;

/// <summary>
/// The roots of a polynomial whose leading coefficients may vanish relative to the rest (a degree drop):
/// the finite roots, and how many roots went to infinity. <c>Finite.Length + InfiniteCount</c> equals the
/// polynomial's nominal degree.
/// </summary>
/// <param name="Finite">
/// The finite roots, sorted by real part then imaginary part; complex roots in exactly conjugate pairs,
/// real roots with imaginary part exactly 0.
/// </param>
/// <param name="InfiniteCount">How many roots are reported at infinity (&gt;= 0).</param>
public sealed record RootSet(ImmutableArray<Complex> Finite, int InfiniteCount);
