using System.Collections.Immutable;

namespace TermLocus.Core.Analysis;

/// <summary>
/// The straight lines the n − m branches that go to infinity approach, for one sign of the swept value
/// (loop p·B/A with n = deg A poles and m = deg B zeros, n &gt; m).
/// </summary>
/// <param name="Sign">The sign of p these asymptotes apply to.</param>
/// <param name="Centroid">Where the asymptotes meet on the real axis, (Σpoles − Σzeros)/(n − m), rad/s.</param>
/// <param name="AnglesDegrees">
/// Their angles in degrees in (-180, 180], k = 0 … n − m − 1 in order: (2k+1)·180/(n − m) where
/// p·lead(B)/lead(A) &gt; 0, k·360/(n − m) where it is negative.
/// </param>
/// <param name="Uses180DegreeRule">True when the (2k+1)·180/(n − m) set applies.</param>
public sealed record AsymptoteSet(LocusGainSign Sign, double Centroid, ImmutableArray<double> AnglesDegrees, bool Uses180DegreeRule);
