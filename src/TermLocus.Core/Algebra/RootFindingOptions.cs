namespace TermLocus.Core.Algebra;

/// <summary>
/// Named tolerances and limits for <see cref="PolynomialRoots"/>. The defaults suit closed-loop characteristic
/// polynomials up to degree about 40; <see cref="Default"/> is what the overloads without options use.
/// </summary>
public sealed record RootFindingOptions
{
    /// <summary>
    /// The defaults: 60 QR iterations per root, 3 Newton polishing steps, repair above backward error 1e-13 in at
    /// most 3 rounds, infinite-root tolerance 1e-12.
    /// </summary>
    public static RootFindingOptions Default { get; } = new();

    /// <summary>
    /// Most Francis double-shift QR iterations spent on one eigenvalue of the companion matrix before giving up
    /// (an exceptional shift is tried every 10). Must be at least 10. When exhausted, the general MathNet
    /// eigenvalue solver is tried on the same matrix before the search is reported as failed.
    /// </summary>
    public int MaxQrIterationsPerRoot { get; init; } = 60;

    /// <summary>
    /// Most Newton steps spent polishing one root on the original (unscaled, unnormalised) coefficients, in [0, 20].
    /// 0 returns the raw eigenvalues. A step is kept only when it lowers the root's backward error and moves the
    /// root by less than half the distance to its nearest neighbour (so polishing never merges two roots).
    /// </summary>
    public int MaxPolishSteps { get; init; } = 3;

    /// <summary>
    /// Backward error above which a root counts as not yet found after Newton polishing, in (0, 1e-6]. Happens
    /// when the roots span so many orders of magnitude (say 1e-12 and 1e12 in one polynomial) that the companion
    /// eigenvalues blur the smallest ones; such polynomials get repair rounds (the reversed polynomial's
    /// eigenvalues, then dividing out the roots already found and solving the rest afresh).
    /// </summary>
    public double RepairBackwardError { get; init; } = 1e-13;

    /// <summary>Most repair rounds, in [0, 10]; 0 turns repair off.</summary>
    public int MaxRepairRounds { get; init; } = 3;

    /// <summary>
    /// Used only by <see cref="PolynomialRoots.FindWithInfinite(Polynomial, RootFindingOptions)"/>: the top k
    /// coefficients count as vanished when, evaluated at the radius that encloses every root of the remaining
    /// polynomial (its Fujiwara bound), each of their terms is at most this fraction of the largest remaining term.
    /// Dimensionless, in [0, 1); 0 turns the detection off. The default 1e-12 sits well above the rounding noise
    /// (about 1e-16) left in a leading coefficient that cancels, e.g. A(s) + p·B(s) at the value of p where
    /// the degree drops.
    /// </summary>
    public double InfiniteRootRelativeTolerance { get; init; } = 1e-12;

    internal void Validate()
    {
        if (MaxQrIterationsPerRoot < 10)
        {
            throw new ArgumentOutOfRangeException(nameof(MaxQrIterationsPerRoot), MaxQrIterationsPerRoot, "Must be at least 10.");
        }

        if (MaxPolishSteps is < 0 or > 20)
        {
            throw new ArgumentOutOfRangeException(nameof(MaxPolishSteps), MaxPolishSteps, "Must be in [0, 20].");
        }

        if (!(RepairBackwardError > 0.0 && RepairBackwardError <= 1e-6))
        {
            throw new ArgumentOutOfRangeException(nameof(RepairBackwardError), RepairBackwardError, "Must be in (0, 1e-6].");
        }

        if (MaxRepairRounds is < 0 or > 10)
        {
            throw new ArgumentOutOfRangeException(nameof(MaxRepairRounds), MaxRepairRounds, "Must be in [0, 10].");
        }

        if (!(InfiniteRootRelativeTolerance >= 0.0 && InfiniteRootRelativeTolerance < 1.0))
        {
            throw new ArgumentOutOfRangeException(
                nameof(InfiniteRootRelativeTolerance), InfiniteRootRelativeTolerance, "Must be in [0, 1).");
        }
    }
}
