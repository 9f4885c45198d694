using System.Collections.Immutable;

namespace TermLocus.Core.Analysis;

/// <summary>
/// A completed Routh array of a real polynomial of degree n, as <see cref="RouthHurwitz.Tabulate(TermLocus.Core.Algebra.Polynomial)"/>
/// builds it: row i belongs to s^(n-i); row 0 holds a_n, a_(n-2), ..., row 1 holds a_(n-1), a_(n-3), ... (zero-padded).
/// </summary>
/// <param name="Rows">The n + 1 rows, each of the same width, after the special-case substitutions.</param>
/// <param name="RightHalfPlaneCount">Roots with Re(s) &gt; 0: the sign changes down the first column.</param>
/// <param name="ImaginaryAxisCount">
/// Roots on the imaginary axis (the origin included) found through the first all-zero row's auxiliary polynomial A:
/// deg A minus twice the sign changes from A's row down; 0 when no row vanished.
/// </param>
/// <param name="EpsilonRows">
/// Rows whose first element came out zero, or smaller than ε, while the rest of the row did not vanish; that element
/// was replaced by ε carrying its sign (+ε for an exact zero), see <see cref="RouthHurwitz"/>.
/// </param>
/// <param name="AuxiliaryRows">Rows that came out all zero and were replaced by the derivative of the auxiliary polynomial of the row above.</param>
public sealed record RouthArray(
    ImmutableArray<ImmutableArray<double>> Rows,
    int RightHalfPlaneCount,
    int ImaginaryAxisCount,
    ImmutableArray<int> EpsilonRows,
    ImmutableArray<int> AuxiliaryRows)
{
    /// <summary>The polynomial's degree n.</summary>
    public int Degree => Rows.Length - 1;

    /// <summary>Roots with Re(s) &lt; 0: the degree minus the other two counts.</summary>
    public int LeftHalfPlaneCount => Degree - RightHalfPlaneCount - ImaginaryAxisCount;

    /// <summary>The first column, top to bottom (n + 1 entries, none zero).</summary>
    public ImmutableArray<double> FirstColumn => [.. Rows.Select(r => r[0])];

    /// <summary>
    /// True when every root lies in the open left half-plane: no special case was needed and the first column keeps
    /// one sign. (A zero in the first column already rules that out.)
    /// </summary>
    public bool IsStable => RightHalfPlaneCount == 0 && ImaginaryAxisCount == 0 && EpsilonRows.IsEmpty && AuxiliaryRows.IsEmpty;
}
