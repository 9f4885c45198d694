namespace TermLocus.Core.Analysis;

/// <summary>Which complex plane a loop's polynomials and poles live in.</summary>
public enum PlaneKind
{
    /// <summary>The s-plane of a continuous loop (Laplace variable s).</summary>
    S,

    /// <summary>The z-plane of a sampled loop (shift variable z, z = e^{sT}).</summary>
    Z,
}
