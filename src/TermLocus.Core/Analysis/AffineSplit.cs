using TermLocus.Core.Algebra;

namespace TermLocus.Core.Analysis;

/// <summary>
/// A characteristic polynomial affine in the swept parameter p: P(s; p) = A(s) + p·B(s).
/// The classic construction facts apply to the loop p·B(s)/A(s).
/// </summary>
/// <param name="A">The part free of p (ascending coefficients in s).</param>
/// <param name="B">The coefficient of p (ascending coefficients in s); not the zero polynomial.</param>
public sealed record AffineSplit(Polynomial A, Polynomial B)
{
    /// <summary>A(s) + p·B(s).</summary>
    public Polynomial At(double p) => A + B.Scale(p);
}
